"use client";

import {
  ROLE_LABELS,
  ROLE_UNITS,
  SCHEDULE_ROLES,
  TELEMATICS_ROLES,
  UNIT_LABELS,
  type TColumnMapping,
  type TColumnRole,
  type TUnit,
} from "@/lib/duty-cycles/column-mapping";
import { Select } from "@/lib/ui/input";

const REQUIRED: Partial<Record<TColumnRole, string>> = {
  time: "required",
  speed: "required",
  headingChange: "required",
  count: "required",
};

/** One line per meaning: which column holds it and in which unit, over a preview of the rows. */
export function ColumnMappingEditor({
  mapping,
  headers,
  rows,
  onChange,
}: {
  mapping: TColumnMapping;
  headers: string[];
  rows: string[][];
  onChange: (columns: TColumnMapping["columns"]) => void;
}) {
  const roles: readonly TColumnRole[] =
    mapping.kind === "telematics" ? TELEMATICS_ROLES : SCHEDULE_ROLES;
  const roleOfColumn = new Map<number, TColumnRole>();
  for (const [role, ref] of Object.entries(mapping.columns))
    if (ref) roleOfColumn.set(ref.index, role as TColumnRole);

  function setColumn(role: TColumnRole, value: string) {
    const next = { ...mapping.columns };
    if (value === "") delete next[role];
    else {
      const index = Number(value);
      const unit = next[role]?.unit ?? ROLE_UNITS[role][0]!;
      next[role] = { index, header: mapping.hasHeader ? headers[index] : undefined, unit };
    }
    onChange(next);
  }
  function setUnit(role: TColumnRole, unit: TUnit) {
    const ref = mapping.columns[role];
    if (ref) onChange({ ...mapping.columns, [role]: { ...ref, unit } });
  }

  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        {roles.map((role) => {
          const ref = mapping.columns[role];
          const units = ROLE_UNITS[role];
          return (
            <fieldset
              key={role}
              className="flex flex-col gap-1 rounded-md border border-ink-200 bg-white p-3"
            >
              <legend className="px-1 text-sm font-medium text-ink-800">
                {ROLE_LABELS[role]}
                {REQUIRED[role] ? (
                  <span className="ml-1 text-xs text-ink-600">({REQUIRED[role]})</span>
                ) : null}
              </legend>
              <label className="sr-only" htmlFor={`col-${role}`}>
                {ROLE_LABELS[role]} column
              </label>
              <Select
                id={`col-${role}`}
                aria-label={`${ROLE_LABELS[role]} column`}
                value={ref ? String(ref.index) : ""}
                onChange={(e) => setColumn(role, e.target.value)}
              >
                <option value="">Not in this file</option>
                {headers.map((h, i) => (
                  <option key={i} value={i}>
                    {mapping.hasHeader ? `${i + 1}: ${h}` : `Column ${i + 1}`}
                  </option>
                ))}
              </Select>
              {ref && units.length > 1 ? (
                <Select
                  aria-label={`${ROLE_LABELS[role]} unit`}
                  value={ref.unit}
                  onChange={(e) => setUnit(role, e.target.value as TUnit)}
                >
                  {units.map((u) => (
                    <option key={u} value={u}>
                      {UNIT_LABELS[u]}
                    </option>
                  ))}
                </Select>
              ) : null}
            </fieldset>
          );
        })}
      </div>
      <div className="overflow-x-auto rounded-lg border border-ink-200 bg-white">
        <table className="min-w-full text-sm">
          <caption className="sr-only">
            Preview of the first rows with the meaning chosen for each column
          </caption>
          <thead className="bg-ink-100 text-left text-xs text-ink-700">
            <tr>
              {headers.map((h, i) => (
                <th key={i} scope="col" className="whitespace-nowrap px-3 py-2 font-medium">
                  <span className="block">{mapping.hasHeader ? h : `Column ${i + 1}`}</span>
                  <span className="block font-normal text-furrow-700">
                    {roleOfColumn.has(i) ? ROLE_LABELS[roleOfColumn.get(i)!] : "—"}
                  </span>
                </th>
              ))}
            </tr>
          </thead>
          <tbody className="divide-y divide-ink-100">
            {rows.slice(0, 8).map((r, ri) => (
              <tr key={ri}>
                {headers.map((_h, ci) => (
                  <td key={ci} className="whitespace-nowrap px-3 py-1.5 font-mono text-ink-800">
                    {r[ci] ?? ""}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
