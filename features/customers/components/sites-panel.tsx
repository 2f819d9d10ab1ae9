"use client";

import { useState } from "react";
import { ZSurfaceKind, type TSurfaceKind } from "@/lib/scrub";
import { Button } from "@/lib/ui/button";
import { Field } from "@/lib/ui/field";
import { Input } from "@/lib/ui/input";
import { toast } from "@/lib/ui/toast";
import { SURFACE_LABELS, ZSurfaceMix } from "@/features/customers/schemas/site";
import { useCreateSite, useCustomerSites, useDeleteSite } from "@/features/customers/api/sites";
import { ApiError } from "@/lib/query/api-fetch";

const SURFACES = ZSurfaceKind.options;

/** Percent inputs → fractions; blank counts as 0. */
export function percentsToMix(
  percents: Record<string, string>,
): Partial<Record<TSurfaceKind, number>> {
  const mix: Partial<Record<TSurfaceKind, number>> = {};
  for (const s of SURFACES) {
    const v = Number(percents[s] || 0);
    if (v) mix[s] = v / 100;
  }
  return mix;
}

function MixBar({ mix }: { mix: Partial<Record<TSurfaceKind, number>> }) {
  const tones: Record<TSurfaceKind, string> = {
    "concrete-asphalt": "bg-ink-500",
    gravel: "bg-ink-300",
    "firm-soil": "bg-caution-800",
    "loose-soil": "bg-caution-300",
    grass: "bg-ok-700",
  };
  return (
    <div className="flex h-3 w-full overflow-hidden rounded" aria-hidden>
      {SURFACES.map((s) =>
        mix[s] ? (
          <div key={s} className={tones[s]} style={{ width: `${(mix[s] ?? 0) * 100}%` }} />
        ) : null,
      )}
    </div>
  );
}

/** A customer's sites with their surface mixes; add and remove (staff only). */
export function SitesPanel({ customerId, canWrite }: { customerId: string; canWrite: boolean }) {
  const sites = useCustomerSites(customerId);
  const create = useCreateSite(customerId);
  const remove = useDeleteSite(customerId);
  const [name, setName] = useState("");
  const [percents, setPercents] = useState<Record<string, string>>({ "firm-soil": "100" });
  const [serverErrors, setServerErrors] = useState<Record<string, string[]>>({});

  const mix = percentsToMix(percents);
  const total = Object.values(mix).reduce<number>((a, b) => a + (b ?? 0), 0) * 100;
  const check = ZSurfaceMix.safeParse(mix);
  const mixError = check.success ? undefined : check.error.issues[0]?.message;

  const add = async () => {
    setServerErrors({});
    try {
      await create.mutateAsync({ name, surfaceMix: mix });
      setName("");
      toast.success("Site added");
    } catch (e) {
      if (e instanceof ApiError) setServerErrors(e.fieldErrors);
      toast.error(e instanceof Error ? e.message : "The site could not be added.");
    }
  };

  return (
    <div className="flex flex-col gap-4">
      {sites.isPending ? <p className="text-sm text-ink-600">Loading sites…</p> : null}
      {sites.isError ? (
        <p role="alert" className="text-sm text-danger-700">
          Sites could not be loaded: {sites.error.message}
        </p>
      ) : null}
      {sites.data && sites.data.items.length === 0 ? (
        <p className="text-sm text-ink-700">
          No sites yet. A site&apos;s surface mix fills in turns logged without a surface.
        </p>
      ) : null}
      <ul className="flex flex-col gap-3">
        {sites.data?.items.map((s) => (
          <li key={s.id} className="flex flex-col gap-1 rounded-md border border-ink-200 p-3">
            <div className="flex items-center justify-between gap-2">
              <span className="font-medium text-ink-900">{s.name}</span>
              {canWrite ? (
                <Button
                  variant="ghost"
                  size="sm"
                  onClick={() => {
                    if (window.confirm(`Delete site ${s.name}? Estimates keep their results.`))
                      remove.mutate(s.id);
                  }}
                >
                  Delete
                </Button>
              ) : null}
            </div>
            <MixBar mix={s.surfaceMix} />
            <p className="text-xs text-ink-700">
              {SURFACES.filter((k) => s.surfaceMix[k])
                .map((k) => `${SURFACE_LABELS[k]} ${Math.round((s.surfaceMix[k] ?? 0) * 100)} %`)
                .join(" · ")}
            </p>
          </li>
        ))}
      </ul>
      {canWrite ? (
        <fieldset className="flex flex-col gap-3 rounded-lg border border-ink-200 p-4">
          <legend className="px-1 text-sm font-medium text-ink-900">Add a site</legend>
          <Field label="Site name" error={serverErrors.name?.[0]}>
            <Input value={name} onChange={(e) => setName(e.target.value)} />
          </Field>
          <div className="grid gap-3 sm:grid-cols-5">
            {SURFACES.map((s) => (
              <Field key={s} label={SURFACE_LABELS[s]} unit="%">
                <Input
                  type="number"
                  min={0}
                  max={100}
                  inputMode="decimal"
                  value={percents[s] ?? ""}
                  onChange={(e) => setPercents({ ...percents, [s]: e.target.value })}
                />
              </Field>
            ))}
          </div>
          <MixBar mix={mix} />
          <p
            className={mixError ? "text-sm text-danger-700" : "text-sm text-ink-700"}
            role="status"
          >
            Shares add up to {total.toFixed(0)} %{mixError ? `: ${mixError}` : ""}
          </p>
          <Button
            variant="secondary"
            className="self-start"
            disabled={!name.trim() || !!mixError}
            busy={create.isPending}
            onClick={add}
          >
            Add site
          </Button>
        </fieldset>
      ) : null}
    </div>
  );
}
