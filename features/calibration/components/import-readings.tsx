"use client";

import { useState } from "react";
import { ApiError } from "@/lib/query/api-fetch";
import { Button } from "@/lib/ui/button";
import { Field } from "@/lib/ui/field";
import { Input, Select } from "@/lib/ui/input";
import { toast } from "@/lib/ui/toast";
import { useImportReadings } from "@/features/calibration/api/calibration";

/** Upload a CSV of readings (e.g. from a depth gauge's export); all rows or none are stored. */
export function ImportReadings({
  machineId,
  defaultName,
}: {
  machineId: string;
  defaultName: string;
}) {
  const [file, setFile] = useState<File | null>(null);
  const [depthUnit, setDepthUnit] = useState<"mm" | "in">("mm");
  const [measuredBy, setMeasuredBy] = useState(defaultName);
  const [errors, setErrors] = useState<string[]>([]);
  const run = useImportReadings(machineId);
  return (
    <form
      className="flex flex-col gap-3"
      onSubmit={async (e) => {
        e.preventDefault();
        if (!file) return setErrors(["Choose a CSV file first."]);
        setErrors([]);
        try {
          const { imported } = await run.mutateAsync({
            csv: await file.text(),
            depthUnit,
            measuredBy,
          });
          toast.success(`${imported} readings imported.`);
        } catch (err) {
          if (err instanceof ApiError)
            setErrors([err.message, ...(err.fieldErrors.csv ?? []).slice(0, 20)]);
          else setErrors(["Could not reach the server; nothing was imported."]);
        }
      }}
    >
      <p className="text-sm text-ink-700">
        Columns: position (FL, FR, RL, RR or front-left…), date (yyyy-mm-dd), hour meter, centre
        depth; optional inner and outer shoulder, measured by, kind (reading or tyre change), size,
        note.
      </p>
      <Field label="CSV file">
        <input
          type="file"
          accept=".csv,text/csv"
          className="block min-h-11 w-full"
          onChange={(e) => setFile(e.target.files?.[0] ?? null)}
        />
      </Field>
      <div className="grid grid-cols-2 gap-3">
        <Field label="Depths in">
          <Select value={depthUnit} onChange={(e) => setDepthUnit(e.target.value as "mm" | "in")}>
            <option value="mm">mm</option>
            <option value="in">inches</option>
          </Select>
        </Field>
        <Field label="Measured by (rows without a name)">
          <Input value={measuredBy} onChange={(e) => setMeasuredBy(e.target.value)} />
        </Field>
      </div>
      {errors.length ? (
        <ul role="alert" className="list-disc pl-5 text-sm text-danger-700">
          {errors.map((m, i) => (
            <li key={i}>{m}</li>
          ))}
        </ul>
      ) : null}
      <Button type="submit" variant="secondary" busy={run.isPending}>
        Import readings
      </Button>
    </form>
  );
}
