"use client";

import { tyreDimensions, type TTyreDimensions } from "@/lib/scrub";
import { formatQuantity, type TUnitSystem } from "@/lib/format/units";

/** The sidewall size read back as dimensions while the user types, or what is wrong with it. */
export function TyreSizePreview({
  designation,
  system,
}: {
  designation: string;
  system: TUnitSystem;
}) {
  if (!designation?.trim()) return null;
  const parsed = readSize(designation);
  if ("error" in parsed)
    return (
      <p className="text-xs text-danger-700" aria-live="polite">
        {parsed.error}
      </p>
    );
  const d = parsed.dims;
  return (
    <p className="text-xs text-ok-700" aria-live="polite">
      Reads as {formatQuantity(system, "length-mm", d.sectionWidth, system === "metric" ? 0 : 1)}{" "}
      wide, {d.aspectRatio} % series, {d.rimDiameter} in rim, about{" "}
      {formatQuantity(system, "length-mm", d.overallDiameter, system === "metric" ? 0 : 1)} overall
      ({d.construction}
      {d.flexion !== "standard" ? `, ${d.flexion}` : ""}). Nominal values: enter the data-book
      figures below when you have them.
    </p>
  );
}

function readSize(designation: string): { dims: TTyreDimensions } | { error: string } {
  try {
    return { dims: tyreDimensions(designation) };
  } catch (e) {
    return { error: (e as Error).message };
  }
}
