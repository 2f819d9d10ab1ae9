"use client";

import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { TTyrePosition } from "@/lib/calibration";
import { ApiError } from "@/lib/query/api-fetch";
import { Button } from "@/lib/ui/button";
import { Field } from "@/lib/ui/field";
import { Input } from "@/lib/ui/input";
import { toast } from "@/lib/ui/toast";
import { useRecordReading } from "@/features/calibration/api/calibration";
import { PositionPlan } from "@/features/calibration/components/position-plan";
import {
  depthToMm,
  depthUnit,
  POSITION_NAMES,
  type TUnitSystem,
} from "@/features/calibration/components/format";
import { PHOTO_MAX_BYTES } from "@/features/calibration/schemas/reading";

type TValues = {
  measuredOn: string;
  hourMeter: string;
  depthCentre: string;
  depthInner: string;
  depthOuter: string;
  measuredBy: string;
  tyreChange: boolean;
  designation: string;
  note: string;
};

/** "12,5" and "12.5" both read as 12.5: phones in some locales offer only a comma. */
const toNumber = (raw: string) => (raw.trim() === "" ? null : Number(raw.trim().replace(",", ".")));

/**
 * One-handed entry in the yard: pick the tyre on the plan, type three depths on the numeric
 * keypad, save; the form keeps date, hour meter and name for the next tyre.
 */
export function ReadingForm({
  machineId,
  system,
  badges,
  defaultName,
}: {
  machineId: string;
  system: TUnitSystem;
  badges: Partial<Record<TTyrePosition, string>>;
  defaultName: string;
}) {
  const [position, setPosition] = useState<TTyrePosition>("front-left");
  const [photos, setPhotos] = useState<File[]>([]);
  const [serverErrors, setServerErrors] = useState<Record<string, string[]>>({});
  const record = useRecordReading(machineId);
  const unit = depthUnit(system);
  const { register, handleSubmit, control, resetField } = useForm<TValues>({
    defaultValues: {
      measuredOn: new Date().toISOString().slice(0, 10),
      hourMeter: "",
      depthCentre: "",
      depthInner: "",
      depthOuter: "",
      measuredBy: defaultName,
      tyreChange: false,
      designation: "",
      note: "",
    },
  });
  const tyreChange = useWatch({ control, name: "tyreChange" });
  const depth = (raw: string) => {
    const v = toNumber(raw);
    return v === null || !Number.isFinite(v) ? null : depthToMm(system, v);
  };
  const submit = handleSubmit(async (v) => {
    setServerErrors({});
    const tooBig = photos.find((p) => p.size > PHOTO_MAX_BYTES);
    if (tooBig) {
      setServerErrors({
        photos: [`${tooBig.name} is larger than ${PHOTO_MAX_BYTES / 1048576} MB.`],
      });
      return;
    }
    try {
      await record.mutateAsync({
        reading: {
          position,
          kind: v.tyreChange ? "fitted" : "reading",
          measuredOn: v.measuredOn,
          hourMeter: toNumber(v.hourMeter) ?? undefined,
          depthCentre: depth(v.depthCentre) ?? undefined,
          depthInner: depth(v.depthInner),
          depthOuter: depth(v.depthOuter),
          designation: v.tyreChange ? v.designation : null,
          measuredBy: v.measuredBy,
          note: v.note,
        },
        photos,
      });
      toast.success(`${POSITION_NAMES[position]} saved.`);
      for (const f of [
        "depthCentre",
        "depthInner",
        "depthOuter",
        "note",
        "designation",
        "tyreChange",
      ] as const)
        resetField(f);
      setPhotos([]);
    } catch (e) {
      if (e instanceof ApiError) {
        setServerErrors(Object.keys(e.fieldErrors).length ? e.fieldErrors : { _: [e.message] });
      } else
        setServerErrors({
          _: ["Could not reach the server; the reading was not saved. Try again."],
        });
    }
  });
  const err = (k: string) => serverErrors[k]?.[0];
  const numeric = { inputMode: "decimal" as const, autoComplete: "off", className: "h-14 text-xl" };
  return (
    <form
      onSubmit={submit}
      className="flex flex-col gap-4"
      aria-label="New tread reading"
      noValidate
    >
      <PositionPlan value={position} onChange={setPosition} badges={badges} />
      <p className="text-center text-sm text-ink-700" aria-live="polite">
        Measuring: <strong>{POSITION_NAMES[position]}</strong>
      </p>
      <div className="grid grid-cols-2 gap-3">
        <Field label="Date" error={err("measuredOn")}>
          <Input type="date" className="h-14" {...register("measuredOn")} />
        </Field>
        <Field label="Hour meter" unit="h" error={err("hourMeter")}>
          <Input {...numeric} inputMode="numeric" {...register("hourMeter")} />
        </Field>
      </div>
      <div className="grid grid-cols-3 gap-2">
        <Field label="Inner shoulder" unit={unit} error={err("depthInner")}>
          <Input {...numeric} {...register("depthInner")} />
        </Field>
        <Field label="Centre" unit={unit} error={err("depthCentre")}>
          <Input {...numeric} {...register("depthCentre")} />
        </Field>
        <Field label="Outer shoulder" unit={unit} error={err("depthOuter")}>
          <Input {...numeric} {...register("depthOuter")} />
        </Field>
      </div>
      <p className="text-xs text-ink-600">
        Measure at the lug or tread bar centre and near each shoulder, away from wear bars, as the
        tyre maker&apos;s guidance describes.
      </p>
      <Field label="Measured by" error={err("measuredBy")}>
        <Input className="h-12" autoComplete="name" {...register("measuredBy")} />
      </Field>
      <label className="flex min-h-12 items-center gap-3 text-base">
        <input type="checkbox" className="size-6" {...register("tyreChange")} />
        New tyre fitted here (starts this position&apos;s history again)
      </label>
      {tyreChange ? (
        <Field
          label="New tyre size"
          error={err("designation")}
          hint="As moulded on the sidewall, e.g. 480/70R28."
        >
          <Input className="h-12" {...register("designation")} />
        </Field>
      ) : null}
      <Field label="Photos (JPEG or PNG, up to 5 MB each)" error={err("photos")}>
        <input
          type="file"
          accept="image/jpeg,image/png"
          capture="environment"
          multiple
          className="block min-h-12 w-full text-base"
          onChange={(e) => setPhotos(Array.from(e.target.files ?? []))}
        />
      </Field>
      <Field label="Note" error={err("note")}>
        <Input className="h-12" {...register("note")} />
      </Field>
      {err("_") ? (
        <p role="alert" className="text-sm text-danger-700">
          {err("_")}
        </p>
      ) : null}
      <Button type="submit" busy={record.isPending} className="h-14 text-lg">
        Save {POSITION_NAMES[position].toLowerCase()} reading
      </Button>
    </form>
  );
}
