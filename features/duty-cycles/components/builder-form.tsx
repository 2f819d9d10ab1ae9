"use client";

import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { ZSurfaceKind, type TSurfaceKind } from "@/lib/scrub/schemas";
import {
  buildDutyCycle,
  HEADLAND_TURNS,
  type TBuilderBlock,
  type TBuilderInput,
  type THeadlandTurn,
  type TYardBlock,
  type TYardTurn,
} from "@/lib/duty-cycles/builder";
import { BUILDER_PRESETS } from "@/lib/duty-cycles/builder-presets";
import { summariseDutyCycle } from "@/lib/duty-cycles/summarise";
import { SURFACE_LABELS } from "@/lib/duty-cycles/surface-names";
import { Button } from "@/lib/ui/button";
import { Card } from "@/lib/ui/card";
import { Caution, EstimateSafetyCaution } from "@/lib/ui/caution";
import { Field } from "@/lib/ui/field";
import { Input, Select } from "@/lib/ui/input";
import { toast } from "@/lib/ui/toast";
import { useCreateDutyCycle, useUpdateDutyCycle } from "@/features/duty-cycles/api/duty-cycles";
import { formatShare, sharesTotal, ZBuilderInput } from "@/features/duty-cycles/schemas/builder";
import { NameAndCustomer } from "@/features/duty-cycles/components/name-and-customer";
import { DutyCycleSummary } from "@/features/duty-cycles/components/duty-cycle-summary";

const KMH = 3.6;
const HEADLAND_LABELS: Record<THeadlandTurn, string> = {
  loop: "Loop (U-turn inside the pass spacing)",
  bulb: "Bulb (omega: swing out, round, back in)",
  "three-point": "Three-point (forward, reverse, forward)",
};

const NEW_BLOCKS: Record<TBuilderBlock["kind"], TBuilderBlock> = {
  field: BUILDER_PRESETS[0]!.input.blocks[0]!,
  yard: BUILDER_PRESETS[1]!.input.blocks[0]!,
  road: BUILDER_PRESETS[0]!.input.blocks[1]!,
};

function NumberField({
  label,
  unit,
  value,
  onChange,
  scale = 1,
  step = "any",
}: {
  label: string;
  unit: string;
  value: number;
  onChange: (v: number) => void;
  scale?: number;
  step?: string;
}) {
  return (
    <Field label={label} unit={unit}>
      <Input
        type="number"
        step={step}
        value={Number.isFinite(value) ? Math.round(value * scale * 1000) / 1000 : ""}
        onChange={(e) => onChange(Number(e.target.value) / scale)}
      />
    </Field>
  );
}

function BlockEditor({
  block,
  onChange,
  onRemove,
}: {
  block: TBuilderBlock;
  onChange: (b: TBuilderBlock) => void;
  onRemove: () => void;
}) {
  const set = (patch: Partial<TBuilderBlock>) => onChange({ ...block, ...patch } as TBuilderBlock);
  const setTurn = (yard: TYardBlock, i: number, patch: Partial<TYardTurn>) =>
    set({ turns: yard.turns.map((x, j) => (j === i ? { ...x, ...patch } : x)) });
  return (
    <fieldset className="rounded-md border border-ink-200 p-4">
      <legend className="px-1 text-sm font-medium text-ink-800">
        {block.kind === "field"
          ? "Field work"
          : block.kind === "yard"
            ? "Yard or loader work"
            : "Road transport"}
        : {block.label}
      </legend>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <Field label="Name">
          <Input value={block.label} onChange={(e) => set({ label: e.target.value })} />
        </Field>
        <NumberField
          label="Share of operating hours"
          unit="%"
          value={block.share}
          scale={100}
          onChange={(v) => set({ share: v })}
        />
        <Field label="Surface">
          <Select
            value={block.surface}
            onChange={(e) => set({ surface: e.target.value as TSurfaceKind })}
          >
            {ZSurfaceKind.options.map((s) => (
              <option key={s} value={s}>
                {SURFACE_LABELS[s]}
              </option>
            ))}
          </Select>
        </Field>
        {block.kind === "field" ? (
          <>
            <NumberField
              label="Field run length"
              unit="m"
              value={block.runLength}
              onChange={(v) => set({ runLength: v })}
            />
            <NumberField
              label="Implement working width"
              unit="m"
              value={block.workingWidth}
              onChange={(v) => set({ workingWidth: v })}
            />
            <NumberField
              label="Working speed"
              unit="km/h"
              value={block.workingSpeed}
              scale={KMH}
              onChange={(v) => set({ workingSpeed: v })}
            />
            <NumberField
              label="Headland turn speed"
              unit="km/h"
              value={block.turnSpeed}
              scale={KMH}
              onChange={(v) => set({ turnSpeed: v })}
            />
            {/* Two columns wide: the turn names are long and must read in full. */}
            <div className="sm:col-span-2">
              <Field label="Headland turn">
                <Select
                  value={block.headlandTurn}
                  onChange={(e) => set({ headlandTurn: e.target.value as THeadlandTurn })}
                >
                  {HEADLAND_TURNS.map((t) => (
                    <option key={t} value={t}>
                      {HEADLAND_LABELS[t]}
                    </option>
                  ))}
                </Select>
              </Field>
            </div>
          </>
        ) : null}
        {block.kind === "yard" ? (
          <>
            <NumberField
              label="Cycles per hour"
              unit="/h"
              value={block.cyclesPerHour}
              onChange={(v) => set({ cyclesPerHour: v })}
            />
            <NumberField
              label="Straight travel per cycle"
              unit="m"
              value={block.travelPerCycle}
              onChange={(v) => set({ travelPerCycle: v })}
            />
            <NumberField
              label="Speed"
              unit="km/h"
              value={block.speed}
              scale={KMH}
              onChange={(v) => set({ speed: v })}
            />
            <div className="sm:col-span-2 lg:col-span-4">
              <p className="mb-1 text-sm font-medium text-ink-800">Turns in one cycle</p>
              <ul className="flex flex-col gap-2">
                {block.turns.map((t, i) => (
                  <li key={i} className="flex flex-wrap items-end gap-2">
                    <NumberField
                      label={`Turn ${i + 1} heading change`}
                      unit="°"
                      value={t.headingChange}
                      onChange={(v) => setTurn(block, i, { headingChange: v })}
                    />
                    <NumberField
                      label="Radius"
                      unit="m"
                      value={t.radius}
                      onChange={(v) => setTurn(block, i, { radius: v })}
                    />
                    <label className="flex h-11 items-center gap-2 text-sm">
                      <input
                        type="checkbox"
                        checked={t.reverse}
                        onChange={(e) => setTurn(block, i, { reverse: e.target.checked })}
                      />
                      Reversing
                    </label>
                    <label className="flex h-11 items-center gap-2 text-sm">
                      <input
                        type="checkbox"
                        checked={t.laden}
                        onChange={(e) => setTurn(block, i, { laden: e.target.checked })}
                      />
                      Laden
                    </label>
                    <Button
                      size="sm"
                      variant="ghost"
                      disabled={block.turns.length <= 1}
                      onClick={() => set({ turns: block.turns.filter((_x, j) => j !== i) })}
                    >
                      Remove turn
                    </Button>
                  </li>
                ))}
              </ul>
              <Button
                size="sm"
                variant="secondary"
                className="mt-2"
                onClick={() =>
                  set({
                    turns: [
                      ...block.turns,
                      { headingChange: 90, radius: 5, reverse: false, laden: false },
                    ],
                  })
                }
              >
                Add a turn
              </Button>
            </div>
          </>
        ) : null}
        {block.kind === "road" ? (
          <>
            <NumberField
              label="Road speed"
              unit="km/h"
              value={block.speed}
              scale={KMH}
              onChange={(v) => set({ speed: v })}
            />
            <NumberField
              label="Share of the route in bends"
              unit="%"
              value={block.bendShare}
              scale={100}
              onChange={(v) => set({ bendShare: v })}
            />
            <NumberField
              label="Typical bend radius"
              unit="m"
              value={block.bendRadius}
              onChange={(v) => set({ bendRadius: v })}
            />
            <NumberField
              label="Typical bend angle"
              unit="°"
              value={block.bendAngle}
              onChange={(v) => set({ bendAngle: v })}
            />
          </>
        ) : null}
        {block.kind !== "yard" ? (
          <label className="flex h-11 items-center gap-2 self-end text-sm">
            <input
              type="checkbox"
              checked={block.laden}
              onChange={(e) => set({ laden: e.target.checked })}
            />
            Laden (carrying a load)
          </label>
        ) : null}
      </div>
      <div className="mt-3 flex justify-end">
        <Button size="sm" variant="ghost" onClick={onRemove}>
          Remove this block
        </Button>
      </div>
    </fieldset>
  );
}

/** A saved builder cycle being changed: its stored inputs and the version the editor opened. */
export type TBuilderEdit = {
  id: string;
  version: number;
  name: string;
  customerId: string;
  builder: TBuilderInput;
};

/**
 * Builds a duty cycle from the work itself when the customer has no telematics log; with
 * `editing`, changes a saved builder cycle (rebuilt from the new inputs, version checked).
 */
export function BuilderForm({
  customers,
  initialCustomerId,
  editing,
}: {
  customers: { id: string; name: string }[];
  /** The customer being worked on (from the customer page), else the first. */
  initialCustomerId?: string;
  editing?: TBuilderEdit;
}) {
  const router = useRouter();
  const [input, setInput] = useState<TBuilderInput>(
    structuredClone(editing?.builder ?? BUILDER_PRESETS[0]!.input),
  );
  const [name, setName] = useState(editing?.name ?? BUILDER_PRESETS[0]!.name);
  const [customerId, setCustomerId] = useState(
    editing?.customerId ??
      customers.find((c) => c.id === initialCustomerId)?.id ??
      customers[0]?.id ??
      "",
  );
  const total = sharesTotal(input.blocks);
  const sharesOff = Math.abs(total - 1) > 0.0005;
  const create = useCreateDutyCycle();
  const update = useUpdateDutyCycle(editing?.id ?? "");
  const saving = editing ? update : create;
  const parsed = ZBuilderInput.safeParse(input);
  const preview = useMemo(() => {
    if (!parsed.success) return null;
    try {
      const built = buildDutyCycle(input);
      return {
        built,
        summary: summariseDutyCycle({
          turns: built.turns,
          straight: built.straight,
          operatingHours: null,
          speedSeconds: built.speedSeconds,
        }),
      };
    } catch {
      return null;
    }
  }, [input, parsed.success]);
  const setBlock = (i: number, b: TBuilderBlock) =>
    setInput((s) => ({ ...s, blocks: s.blocks.map((x, j) => (j === i ? b : x)) }));

  async function save() {
    try {
      if (editing) {
        await update.mutateAsync({ name, customerId, builder: input, version: editing.version });
        toast.success("Duty cycle saved.");
        router.push(`/duty-cycles/${editing.id}`);
        return;
      }
      const created = await create.mutateAsync({
        source: "builder",
        name,
        customerId,
        builder: input,
      });
      toast.success("Duty cycle saved.");
      router.push(`/duty-cycles/${created.id}`);
    } catch (e) {
      toast.error((e as Error).message);
    }
  }

  return (
    <div className="flex flex-col gap-5">
      <Card title={editing ? "Machine" : "Start from an example"}>
        <div className="grid gap-3 sm:grid-cols-2">
          {editing ? null : (
            <Field
              label="Example"
              hint="Invented starting points: change every figure to match the customer's work."
            >
              <Select
                onChange={(e) => {
                  const p = BUILDER_PRESETS.find((x) => x.key === e.target.value);
                  if (p) {
                    setInput(structuredClone(p.input));
                    setName(p.name);
                  }
                }}
              >
                {BUILDER_PRESETS.map((p) => (
                  <option key={p.key} value={p.key}>
                    {p.name}
                  </option>
                ))}
              </Select>
            </Field>
          )}
          <NumberField
            label="Tightest turning radius of the machine"
            unit="m"
            value={input.minTurningRadius}
            onChange={(v) => setInput((s) => ({ ...s, minTurningRadius: v }))}
          />
        </div>
      </Card>
      <Card title="Blocks of work">
        <div className="flex flex-col gap-4">
          {input.blocks.map((b, i) => (
            <BlockEditor
              key={i}
              block={b}
              onChange={(nb) => setBlock(i, nb)}
              onRemove={() =>
                setInput((s) => ({ ...s, blocks: s.blocks.filter((_x, j) => j !== i) }))
              }
            />
          ))}
          <p
            role="status"
            data-testid="shares-total"
            className={sharesOff ? "text-sm font-medium text-danger-700" : "text-sm text-ink-700"}
          >
            Shares of the operating hours add up to {formatShare(total)}
            {sharesOff ? " — they must add up to 100 %." : "."}
          </p>
          <div className="flex flex-wrap gap-2">
            {(["field", "yard", "road"] as const).map((k) => (
              <Button
                key={k}
                size="sm"
                variant="secondary"
                onClick={() =>
                  setInput((s) => ({
                    ...s,
                    blocks: [...s.blocks, structuredClone({ ...NEW_BLOCKS[k], share: 0.1 })],
                  }))
                }
              >
                Add {k === "field" ? "field work" : k === "yard" ? "yard work" : "road transport"}
              </Button>
            ))}
          </div>
          {!parsed.success ? (
            <Caution title="Some figures need a look" tone="info">
              <ul className="list-disc pl-5">
                {parsed.error.issues.slice(0, 6).map((i) => (
                  <li key={i.path.join(".") + i.message}>{i.message}</li>
                ))}
              </ul>
            </Caution>
          ) : null}
        </div>
      </Card>
      {preview ? (
        <Card title="What one operating hour looks like">
          {preview.built.notes.length > 0 ? (
            <ul className="mb-4 list-disc pl-5 text-sm text-ink-700">
              {preview.built.notes.map((n) => (
                <li key={n}>{n}</li>
              ))}
            </ul>
          ) : null}
          <DutyCycleSummary summary={preview.summary} />
        </Card>
      ) : null}
      <Card title="Save">
        <NameAndCustomer
          name={name}
          onName={setName}
          customerId={customerId}
          onCustomer={setCustomerId}
          customers={customers}
          error={saving.error}
        />
        {editing ? (
          <p className="mt-3 text-sm text-ink-700">
            Saving rebuilds the turns from these figures. Estimates already run keep the turns they
            were run with; run a new estimate to see the change.
          </p>
        ) : null}
        <div className="mt-4 flex justify-end">
          <Button
            disabled={!parsed.success || !name.trim() || !customerId}
            busy={saving.isPending}
            onClick={save}
          >
            {editing ? "Save changes" : "Save duty cycle"}
          </Button>
        </div>
      </Card>
      <EstimateSafetyCaution />
    </div>
  );
}
