// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, within } from "@testing-library/react";
import { AppRouterContext } from "next/dist/shared/lib/app-router-context.shared-runtime";
import { afterEach, describe, expect, it } from "vitest";
import { estimate, ENGINE_VERSION } from "@/lib/scrub";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { DEMO_DUTY_CYCLES } from "@/lib/demo/duty-cycles";
import { estimateKeys } from "@/features/estimates/api/estimates";
import { EstimateResult } from "@/features/estimates/components/estimate-result";
import type { TEstimateDto } from "@/features/estimates/schemas/estimate";

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
};

function show(system: "metric" | "imperial") {
  const client = new QueryClient();
  client.setQueryData(estimateKeys.detail(dto.id), dto);
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

  it("shows tread wear in inches per 100 h to an imperial user (1 in = 25.4 mm, NIST SP 811)", () => {
    show("imperial");
    const table = screen.getByTestId("positions-table");
    expect(within(table).getByText("Total (in/100 h)")).toBeTruthy();
    const p = result.positions[0]!;
    const row = within(table).getAllByRole("row")[1]!;
    expect(within(row).getByText((p.wearPer100h.total / 25.4).toFixed(3))).toBeTruthy();
  });
});
