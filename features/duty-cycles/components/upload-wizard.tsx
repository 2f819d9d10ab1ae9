"use client";

import { useRouter } from "next/navigation";
import { useEffect, useMemo, useRef, useState } from "react";
import { ZSurfaceKind, type TSurfaceKind } from "@/lib/scrub/schemas";
import {
  mappingProblems,
  type TColumnMapping,
  type TColumnRef,
  type TColumnRole,
  type TFileKind,
} from "@/lib/duty-cycles/column-mapping";
import { guessColumns, guessDecimal, guessKind } from "@/lib/duty-cycles/guess-mapping";
import { detectEncoding, ENCODING_DETECTED_NOTE } from "@/lib/duty-cycles/detect-encoding";
import { SURFACE_LABELS } from "@/lib/duty-cycles/surface-names";
import { Button } from "@/lib/ui/button";
import { Card } from "@/lib/ui/card";
import { Caution } from "@/lib/ui/caution";
import { Field } from "@/lib/ui/field";
import { Input, Select } from "@/lib/ui/input";
import { toast } from "@/lib/ui/toast";
import { useCreateDutyCycle } from "@/features/duty-cycles/api/duty-cycles";
import {
  useMappingTemplates,
  useSaveMappingTemplate,
} from "@/features/duty-cycles/api/mapping-templates";
import { useUploadFile } from "@/features/duty-cycles/api/upload-file";
import { ColumnMappingEditor } from "@/features/duty-cycles/components/column-mapping-editor";
import { NameAndCustomer } from "@/features/duty-cycles/components/name-and-customer";
import { ProgressBar } from "@/features/duty-cycles/components/progress-bar";
import { readPreview, type TPreview } from "@/features/duty-cycles/components/read-preview";

type TCustomerChoice = { id: string; name: string };

const DELIMITERS: [string, string][] = [
  ["", "Detect"],
  [",", "Comma ,"],
  [";", "Semicolon ;"],
  ["\t", "Tab"],
  ["|", "Bar |"],
];

const initialMapping = (kind: TFileKind): TColumnMapping => ({
  kind,
  delimiter: ",",
  decimal: ".",
  hasHeader: true,
  encoding: "utf-8",
  columns: {},
  defaults: { surface: "firm-soil", loadState: "unladen", shiftHours: 8, maxSpeed: 25 },
});

/** Upload a CSV, map its columns over a preview, and start the import. */
export function UploadWizard({
  customers,
  uploadLimitBytes,
}: {
  customers: TCustomerChoice[];
  uploadLimitBytes: number;
}) {
  const router = useRouter();
  const [file, setFile] = useState<File | null>(null);
  const [delimiterChoice, setDelimiterChoice] = useState("");
  const [mapping, setMapping] = useState<TColumnMapping>(initialMapping("telematics"));
  const [preview, setPreview] = useState<TPreview | null>(null);
  const [previewError, setPreviewError] = useState<string | null>(null);
  const [encodingDetected, setEncodingDetected] = useState(false);
  const [progress, setProgress] = useState(0);
  const [name, setName] = useState("");
  const [customerId, setCustomerId] = useState(customers[0]?.id ?? "");
  const [templateName, setTemplateName] = useState("");
  const [templateApplied, setTemplateApplied] = useState(false);
  // The latest preview and whether the user picked the kind, read by handlers that may run
  // before React re-renders with a preview that just arrived (a stale closure would map an
  // empty header row and leave the import disabled).
  const latestPreview = useRef<TPreview | null>(null);
  const kindChosen = useRef(false);
  const upload = useUploadFile(setProgress);
  const create = useCreateDutyCycle();
  const templates = useMappingTemplates(mapping.kind);
  const saveTemplate = useSaveMappingTemplate();

  // Re-read the preview when the file or how it is read changes.
  useEffect(() => {
    if (!file) return;
    let stale = false;
    readPreview(file, { delimiter: delimiterChoice, encoding: mapping.encoding })
      .then((p) => {
        if (stale) return;
        latestPreview.current = p;
        setPreview(p);
        setPreviewError(p.rows.length === 0 ? "The file shows no rows. Is it empty?" : null);
        setMapping((m) => {
          const headers = m.hasHeader
            ? (p.rows[0] ?? [])
            : (p.rows[0] ?? []).map((_c, i) => `Column ${i + 1}`);
          const body = m.hasHeader ? p.rows.slice(1) : p.rows;
          const kind =
            templateApplied || kindChosen.current ? m.kind : guessKind(headers, body.length);
          return {
            ...m,
            kind,
            delimiter: p.delimiter,
            decimal: templateApplied ? m.decimal : guessDecimal(p.delimiter, body),
            columns: templateApplied
              ? m.columns
              : guessColumns(kind, m.hasHeader ? headers : [], body[0]),
          };
        });
      })
      .catch(
        () =>
          !stale &&
          setPreviewError("The file could not be read as text. Save it as CSV and try again."),
      );
    return () => {
      stale = true;
    };
    // templateApplied is read, not watched: applying a template must not re-guess.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [file, delimiterChoice, mapping.encoding, mapping.hasHeader]);

  const headers = useMemo(() => {
    const first = preview?.rows[0] ?? [];
    return mapping.hasHeader ? first : first.map((_c, i) => `Column ${i + 1}`);
  }, [preview, mapping.hasHeader]);
  const bodyRows = useMemo(
    () => (mapping.hasHeader ? (preview?.rows.slice(1) ?? []) : (preview?.rows ?? [])),
    [preview, mapping.hasHeader],
  );
  const problems = mappingProblems(mapping);
  const uploaded = upload.data;

  function chooseFile(f: File | null) {
    latestPreview.current = null;
    setPreview(null);
    setEncodingDetected(false);
    if (f) {
      // Detect the encoding before the first preview, so headers never show as "L�nge".
      const head = f.slice(0, 65536);
      void head.arrayBuffer().then((bytes) => {
        const encoding = detectEncoding(new Uint8Array(bytes), { complete: f.size <= 65536 });
        setEncodingDetected(encoding === "latin1");
        setMapping((m) => ({ ...m, encoding }));
        setFile(f);
      });
    } else setFile(f);
    setProgress(0);
    upload.reset();
    if (!f) return;
    if (f.size > uploadLimitBytes) {
      setPreviewError(
        `The file is ${(f.size / 1048576).toFixed(1)} MB; the upload limit is ${(uploadLimitBytes / 1048576).toFixed(0)} MB. Split the log into shorter periods.`,
      );
      return;
    }
    if (!name) setName(f.name.replace(/\.[^.]+$/, ""));
    // Upload starts at once, while the columns are being mapped.
    upload.mutate(f, { onError: (e) => toast.error(e.message) });
  }

  function applyTemplate(id: string) {
    const t = templates.data?.find((x) => x.id === id);
    if (!t) return;
    setTemplateApplied(true);
    setDelimiterChoice(t.mapping.delimiter);
    // Match the template's columns by name where this file names them: exports from the same
    // source sometimes add or move a column.
    const byName = new Map(headers.map((h, i) => [h.trim().toLowerCase(), i]));
    const columns: TColumnMapping["columns"] = {};
    for (const [role, ref] of Object.entries(t.mapping.columns) as [TColumnRole, TColumnRef][]) {
      const index = ref.header ? byName.get(ref.header.trim().toLowerCase()) : undefined;
      columns[role] = { ...ref, index: index ?? ref.index };
    }
    setMapping({ ...t.mapping, columns });
    toast.success(`Template "${t.name}" applied.`);
  }

  async function submit() {
    if (!uploaded) return;
    try {
      const created = await create.mutateAsync({
        source: "upload",
        name,
        customerId,
        uploadId: uploaded.id,
        mapping,
      });
      router.push(`/duty-cycles/${created.id}`);
    } catch (e) {
      toast.error((e as Error).message);
    }
  }

  return (
    <div className="flex flex-col gap-5">
      <Card title="1. Choose the file">
        <div className="grid gap-4 sm:grid-cols-2">
          <Field
            label="CSV file"
            hint={`A telematics log or a turn schedule, up to ${(uploadLimitBytes / 1048576).toFixed(0)} MB.`}
          >
            <Input
              type="file"
              accept=".csv,.txt,text/csv"
              className="py-2"
              onChange={(e) => chooseFile(e.target.files?.[0] ?? null)}
            />
          </Field>
          <Field label="What the file holds">
            <Select
              value={mapping.kind}
              onChange={(e) => {
                const kind = e.target.value as TFileKind;
                kindChosen.current = true;
                setMapping((m) => {
                  const rows = latestPreview.current?.rows ?? [];
                  const body = m.hasHeader ? rows.slice(1) : rows;
                  return {
                    ...m,
                    kind,
                    columns: guessColumns(kind, m.hasHeader ? (rows[0] ?? []) : [], body[0]),
                  };
                });
              }}
            >
              <option value="telematics">Telematics log (one row per sample)</option>
              <option value="schedule">Turn schedule (one row per kind of turn)</option>
            </Select>
          </Field>
        </div>
        {file ? (
          <div className="mt-4">
            <ProgressBar
              label={upload.isError ? "Upload failed" : uploaded ? "Uploaded" : "Uploading"}
              value={progress}
              tone={upload.isError ? "failed" : uploaded ? "done" : "work"}
            />
            {upload.isError ? (
              <p role="alert" className="mt-2 text-sm text-danger-700">
                {upload.error.message}
              </p>
            ) : null}
          </div>
        ) : null}
        {previewError ? (
          <p role="alert" className="mt-3 text-sm text-danger-700">
            {previewError}
          </p>
        ) : null}
      </Card>

      {preview && preview.rows.length > 0 ? (
        <Card title="2. Map the columns">
          {encodingDetected && mapping.encoding === "latin1" ? (
            <div className="mb-4">
              <Caution title="Text encoding detected" tone="info">
                {ENCODING_DETECTED_NOTE}
              </Caution>
            </div>
          ) : null}
          <div className="mb-4 grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
            <Field label="Field separator">
              <Select value={delimiterChoice} onChange={(e) => setDelimiterChoice(e.target.value)}>
                {DELIMITERS.map(([v, l]) => (
                  <option key={l} value={v}>
                    {l}
                    {v === "" && preview
                      ? ` (found ${preview.delimiter === "\t" ? "tab" : preview.delimiter})`
                      : ""}
                  </option>
                ))}
              </Select>
            </Field>
            <Field label="Decimal mark">
              <Select
                value={mapping.decimal}
                onChange={(e) =>
                  setMapping((m) => ({ ...m, decimal: e.target.value as "." | "," }))
                }
              >
                <option value=".">Point 12.5</option>
                <option value=",">Comma 12,5</option>
              </Select>
            </Field>
            <Field label="Text encoding">
              <Select
                value={mapping.encoding}
                onChange={(e) => {
                  setEncodingDetected(false);
                  setMapping((m) => ({ ...m, encoding: e.target.value as "utf-8" | "latin1" }));
                }}
              >
                <option value="utf-8">UTF-8</option>
                <option value="latin1">Latin-1 / Windows-1252 (older Windows exports)</option>
              </Select>
            </Field>
            <Field label="First row">
              <Select
                value={mapping.hasHeader ? "header" : "data"}
                onChange={(e) =>
                  setMapping((m) => ({ ...m, hasHeader: e.target.value === "header" }))
                }
              >
                <option value="header">Column names</option>
                <option value="data">Data</option>
              </Select>
            </Field>
          </div>
          {templates.data && templates.data.length > 0 ? (
            <div className="mb-4 max-w-sm">
              <Field
                label="Use a saved mapping"
                hint="Templates your dealership saved for files from the same source."
              >
                <Select defaultValue="" onChange={(e) => applyTemplate(e.target.value)}>
                  <option value="">Choose a template…</option>
                  {templates.data.map((t) => (
                    <option key={t.id} value={t.id}>
                      {t.name}
                    </option>
                  ))}
                </Select>
              </Field>
            </div>
          ) : null}
          <ColumnMappingEditor
            mapping={mapping}
            headers={headers}
            rows={bodyRows}
            onChange={(columns) => setMapping((m) => ({ ...m, columns }))}
          />
          <div className="mt-4 grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
            <Field label="Surface when the file gives none">
              <Select
                value={mapping.defaults.surface}
                onChange={(e) =>
                  setMapping((m) => ({
                    ...m,
                    defaults: { ...m.defaults, surface: e.target.value as TSurfaceKind },
                  }))
                }
              >
                {ZSurfaceKind.options.map((s) => (
                  <option key={s} value={s}>
                    {SURFACE_LABELS[s]}
                  </option>
                ))}
              </Select>
            </Field>
            <Field label="Load state when the file gives none">
              <Select
                value={mapping.defaults.loadState}
                onChange={(e) =>
                  setMapping((m) => ({
                    ...m,
                    defaults: { ...m.defaults, loadState: e.target.value as "laden" | "unladen" },
                  }))
                }
              >
                <option value="unladen">Unladen</option>
                <option value="laden">Laden</option>
              </Select>
            </Field>
            <Field
              label="Machine's top speed"
              unit="km/h"
              hint="Faster rows are rejected as impossible."
            >
              <Input
                type="number"
                min={1}
                max={144}
                value={Math.round(mapping.defaults.maxSpeed * 3.6)}
                onChange={(e) =>
                  setMapping((m) => ({
                    ...m,
                    defaults: { ...m.defaults, maxSpeed: Number(e.target.value) / 3.6 },
                  }))
                }
              />
            </Field>
            {mapping.kind === "telematics" ? (
              <Field label="Wheelbase" unit="m" hint="Needed only to read a steer angle column.">
                <Input
                  type="number"
                  step="0.01"
                  min={0.5}
                  max={15}
                  value={mapping.defaults.wheelbase ?? ""}
                  onChange={(e) =>
                    setMapping((m) => ({
                      ...m,
                      defaults: {
                        ...m.defaults,
                        wheelbase: e.target.value ? Number(e.target.value) : undefined,
                      },
                    }))
                  }
                />
              </Field>
            ) : (
              <Field label="Hours in a shift" unit="h">
                <Input
                  type="number"
                  min={1}
                  max={24}
                  value={mapping.defaults.shiftHours}
                  onChange={(e) =>
                    setMapping((m) => ({
                      ...m,
                      defaults: { ...m.defaults, shiftHours: Number(e.target.value) || 8 },
                    }))
                  }
                />
              </Field>
            )}
          </div>
          {problems.length > 0 ? (
            <div className="mt-4">
              <Caution title="The mapping is not complete yet" tone="info">
                <ul className="list-disc pl-5">
                  {problems.map((p) => (
                    <li key={p}>{p}</li>
                  ))}
                </ul>
              </Caution>
            </div>
          ) : null}
          <div className="mt-4 flex flex-wrap items-end gap-2">
            <div className="min-w-64">
              <Field label="Save this mapping as a template">
                <Input
                  value={templateName}
                  placeholder="e.g. Hollin Vale loader logger"
                  onChange={(e) => setTemplateName(e.target.value)}
                />
              </Field>
            </div>
            <Button
              variant="secondary"
              disabled={!templateName.trim() || problems.length > 0}
              busy={saveTemplate.isPending}
              onClick={() =>
                saveTemplate.mutate(
                  { name: templateName.trim(), mapping },
                  {
                    onSuccess: (t) => toast.success(`Saved the template "${t.name}".`),
                    onError: (e) => toast.error(e.message),
                  },
                )
              }
            >
              Save template
            </Button>
          </div>
        </Card>
      ) : null}

      {preview && preview.rows.length > 0 ? (
        <Card title="3. Name it and import">
          <NameAndCustomer
            name={name}
            onName={setName}
            customerId={customerId}
            onCustomer={setCustomerId}
            customers={customers}
            error={create.error}
          />
          <div className="mt-4 flex justify-end">
            <Button
              disabled={!uploaded || problems.length > 0 || !name.trim() || !customerId}
              busy={create.isPending}
              onClick={submit}
            >
              {uploaded ? "Import" : "Waiting for the upload…"}
            </Button>
          </div>
        </Card>
      ) : null}
    </div>
  );
}
