// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, within } from "@testing-library/react";
import { AppRouterContext } from "next/dist/shared/lib/app-router-context.shared-runtime";
import { afterEach, describe, expect, it } from "vitest";
import { estimate, ENGINE_VERSION, ZDutyCycle } from "@/lib/scrub";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { DEMO_DUTY_CYCLES } from "@/lib/demo/duty-cycles";
import { estimateKeys } from "@/features/estimates/api/estimates";
import { EstimateResult } from "@/features/estimates/components/estimate-result";
import type { TEstimateDto } from "@/features/estimates/schemas/estimate";
import { turnTraitsFromInputs } from "@/features/estimates/lib/turn-kinds";

const router = {
  push: () => {},
  replace: () => {},
  refresh: () => {},
  back: () => {},
  forward: () => {},
  prefetch: () => {},
};
const demo = DEMO_MACHINES.find((m) => m.id === "row-crop-tractor")!;
const result = estimate(demo.machine, DEMO_DUTY_CYCLES[demo.id]!);
const first = result.positions.find((p) => p.wearsFirst)!;
const dto: TEstimateDto = {
  id: "0b8f1e5a-4a6e-4a8e-9a6e-2f1f0c1d2e3f",
  title: "Demo tractor on headlands",
  customerId: null,
  customerName: "Hollin Vale Farm",
  machineId: "1c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f",
  machineName: demo.machine.name,
  dutyCycleName: result.dutyCycleName,
  costPerHour: result.costPerHour,
  hoursToFirstReplacement: first.hoursToReplacement,
  firstToWear: result.firstToWear,
  warningCount: result.warnings.length,
  createdAt: "2026-12-01T09:00:00.000Z",
  dutyCycleId: null,
  dutyCycleVersion: 1,
  siteId: null,
  machineVersion: 1,
  engineVersion: ENGINE_VERSION,
  result,
  turnTraits: turnTraitsFromInputs(
    { dutyCycle: ZDutyCycle.parse(DEMO_DUTY_CYCLES[demo.id]!) },
    demo.machine.steering.layout,
  ),
};

function show(system: "metric" | "imperial", shown: TEstimateDto = dto) {
  const client = new QueryClient();
  client.setQueryData(estimateKeys.detail(dto.id), shown);
  return render(
    <AppRouterContext.Provider value={router as never}>
      <QueryClientProvider client={client}>
        <EstimateResult id={dto.id} system={system} currency="GBP" canWrite={false} />
      </QueryClientProvider>
    </AppRouterContext.Provider>,
  );
}

afterEach(cleanup);

describe("estimate result page", () => {
  it("lists every position, marks the one that wears first and shows the cautions and warnings", () => {
    show("metric");
    const table = screen.getByTestId("positions-table");
    const rows = within(table).getAllByRole("row").slice(1);
    expect(rows).toHaveLength(4);
    expect(within(table).getAllByText("wears first")).toHaveLength(1);
    expect(screen.getByText("Estimates only: not load, pressure or speed advice")).toBeTruthy();
    for (const w of result.warnings) expect(screen.getByText(w.message)).toBeTruthy();
    for (const c of result.cautions) expect(screen.getByText(c.text)).toBeTruthy();
    expect(screen.getByRole("link", { name: "Download turns (CSV)" }).getAttribute("href")).toBe(
      `/api/v1/estimates/${dto.id}/csv`,
    );
    expect(screen.queryByRole("button", { name: "Delete" })).toBeNull();
  });

  it("shows every amount with the dealership's currency (Intl.NumberFormat, en-GB)", () => {
    show("metric");
    const total = new Intl.NumberFormat("en-GB", { style: "currency", currency: "GBP" }).format(
      result.costPerHour,
    );
    expect(screen.getByTestId("cost-per-hour").textContent).toBe(total);
    expect(total.startsWith("£")).toBe(true);
    const table = screen.getByTestId("positions-table");
    expect(within(table).getByText("Cost per hour (GBP)")).toBeTruthy();
    const cells = within(table).getAllByText(/^£\d/);
    expect(cells).toHaveLength(result.positions.length);
  });

  it("folds the general cautions into one line and puts each specific one beside its subject", () => {
    show("metric");
    const summary = screen.getByTestId("caution-summary");
    expect(summary.tagName).toBe("DETAILS");
    expect(summary.hasAttribute("open")).toBe(false);
    expect(within(summary).getByText(/Read all \d+ cautions/)).toBeTruthy();
    // A front-steer, four-wheel-driven tractor: the lead caution sits in the lead card, and
    // there is no stability caution anywhere.
    const lead = result.cautions.find((c) => c.code === "lead-matching")!;
    expect(within(screen.getByTestId("lead-card")).getByText(lead.text)).toBeTruthy();
    expect(within(summary).queryByText(lead.text)).toBeNull();
    expect(screen.queryByTestId("stability-caution")).toBeNull();
  });

  it("hides the lead card on a skid steer and shows its stability caution by the title", () => {
    const skid = DEMO_MACHINES.find((m) => m.machine.steering.layout === "skid")!;
    const skidResult = estimate(skid.machine, DEMO_DUTY_CYCLES[skid.id]!);
    show("metric", { ...dto, result: skidResult, machineName: skid.machine.name });
    expect(screen.queryByTestId("lead-card")).toBeNull();
    expect(screen.queryByText("Front axle lead in straight travel")).toBeNull();
    const stability = skidResult.cautions.find((c) => c.code === "stability")!;
    expect(screen.getByTestId("stability-caution").textContent).toBe(stability.text);
    for (const c of skidResult.cautions) expect(screen.getByText(c.text)).toBeTruthy();
  });

  it("shows tread wear in inches per 100 h to an imperial user (1 in = 25.4 mm, NIST SP 811)", () => {
    show("imperial");
    const table = screen.getByTestId("positions-table");
    expect(within(table).getByText("Total (in/100 h)")).toBeTruthy();
    const p = result.positions[0]!;
    const row = within(table).getAllByRole("row")[1]!;
    expect(within(row).getByText((p.wearPer100h.total / 25.4).toFixed(3))).toBeTruthy();
  });

  it("merges identical turn rows and shows what tells kinds apart and what each costs in scrub", () => {
    const headland = {
      label: "Cultivating: headland bulb turn",
      direction: "left" as const,
      radius: 5.5,
      headingChange: 180,
      speed: 1.5,
      surface: "firm-soil" as const,
    };
    const cycle = ZDutyCycle.parse({
      name: "Spring cultivating",
      turns: [
        ...Array.from({ length: 6 }, () => ({ turn: headland, perHour: 11 / 6 })),
        { turn: { ...headland, direction: "right" }, perHour: 4 },
      ],
      straight: { distancePerHour: 4000, speed: 2.5, surfaceShares: { "firm-soil": 1 } },
    });
    const r = estimate(demo.machine, cycle);
    show("metric", {
      ...dto,
      result: r,
      turnTraits: turnTraitsFromInputs({ dutyCycle: cycle }, demo.machine.steering.layout),
    });
    const table = screen.getByTestId("turns-table");
    const rows = within(table).getAllByRole("row").slice(1);
    expect(rows).toHaveLength(2);
    const headers = within(table)
      .getAllByRole("columnheader")
      .map((h) => h.textContent);
    expect(headers).toContain("Direction");
    expect(headers).toContain("Scrub energy");
    expect(headers).toContain("Scrub wear");
    expect(headers).toContain("Scrub cost per hour (GBP)");
    // The shared traits are said once, not repeated in every row.
    expect(headers).not.toContain("Surface");
    expect(screen.getByTestId("turn-kinds-summary").textContent).toMatch(
      /5 identical rows of the duty cycle merged.*Shared by every kind: Firm soil · 5\.4 km\/h · unladen/,
    );
    const merged = rows.find((row) => within(row).queryByText("× 6 rows"))!;
    expect(within(merged).getByText("11.0")).toBeTruthy();
    expect(within(merged).getByText("left")).toBeTruthy();
    // Two kinds share all the scrub: the two energy percentages add up to 100 %.
    const energy = rows.map((row) =>
      Number(within(row).getAllByRole("cell").at(-3)!.textContent!.replace(" %", "")),
    );
    expect(energy[0]! + energy[1]!).toBeCloseTo(100, 0);
    expect(within(table).getAllByText(/^£\d/)).toHaveLength(2);
  });
  it("draws scrub in one colour in every chart, apart from slip", () => {
    const { container } = show("metric");
    const fills = (label: RegExp) =>
      [...container.querySelectorAll("figure")]
        .filter((f) => label.test(f.querySelector("figcaption")?.textContent ?? ""))
        .flatMap((f) => [...f.querySelectorAll("svg[role=img] rect")])
        .flatMap((r) => (r.getAttribute("class") ?? "").split(/\s+/))
        .filter((c) => c.startsWith("fill-") && c !== "fill-ink-300");
    const scrubPerHour = new Set(fills(/^Scrub distance/));
    const scrubWear = new Set(fills(/wear/i));
    const slip = new Set(fills(/slip angle/i));
    expect(scrubPerHour.size).toBe(1);
    expect(scrubWear).toEqual(scrubPerHour);
    expect([...slip].some((c) => scrubPerHour.has(c))).toBe(false);
  });
});
