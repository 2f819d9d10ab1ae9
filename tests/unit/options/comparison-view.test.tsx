// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import { AppRouterContext } from "next/dist/shared/lib/app-router-context.shared-runtime";
import { afterEach, describe, expect, it, vi } from "vitest";
import { compareOptions, ENGINE_VERSION, sweepParameter } from "@/lib/scrub";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { DEMO_DUTY_CYCLES } from "@/lib/demo/duty-cycles";
import { studyKeys } from "@/features/options/api/studies";
import { ComparisonView } from "@/features/options/components/comparison-view";
import { SweepView } from "@/features/options/components/sweep-view";
import type { TComparisonDto, TSweepDto } from "@/features/options/schemas/study";

const push = vi.fn();
const router = {
  push,
  replace: () => {},
  refresh: () => {},
  back: () => {},
  forward: () => {},
  prefetch: () => {},
};
const demo = DEMO_MACHINES.find((m) => m.id === "row-crop-tractor")!;
const duty = DEMO_DUTY_CYCLES[demo.id]!;
const result = compareOptions(
  demo.machine,
  duty,
  [
    {
      name: "Longer arms",
      changes: [{ kind: "parameter", parameter: "armAngle", value: 12 }],
      oneOffCost: 400,
    },
    {
      name: "Wider front",
      changes: [{ kind: "parameter", parameter: "frontTrack", value: 2.0 }],
      oneOffCost: 900,
    },
  ],
  { hours: 2000 },
);
const row = {
  seriesId: "5e0b9c1a-8a57-4d0e-9c3f-0a1b2c3d4e5f",
  version: 1,
  customerId: null,
  machineId: "1c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f",
  machineName: demo.machine.name,
  estimateId: "0b8f1e5a-4a6e-4a8e-9a6e-2f1f0c1d2e3f",
  engineVersion: ENGINE_VERSION,
  createdAt: "2026-12-01T09:00:00.000Z",
};
const dto: TComparisonDto = {
  ...row,
  id: "5e0b9c1a-8a57-4d0e-9c3f-0a1b2c3d4e5f",
  kind: "comparison",
  title: "Tractor: other setups",
  currentCostPerHour: result.current.costPerHour,
  bestCostPerHour: null,
  hours: 2000,
  result,
};

function wrap(ui: React.ReactNode, seed: (qc: QueryClient) => void) {
  const client = new QueryClient();
  seed(client);
  return render(
    <AppRouterContext.Provider value={router as never}>
      <QueryClientProvider client={client}>{ui}</QueryClientProvider>
    </AppRouterContext.Provider>,
  );
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  push.mockReset();
});

describe("comparison page", () => {
  it("shows a table per position, each option's reasons and the track caution beside the track option only", () => {
    wrap(<ComparisonView id={dto.id} system="metric" currency="EUR" canRun canShare />, (qc) =>
      qc.setQueryData(studyKeys.detail("comparison", dto.id), dto),
    );
    for (const pos of ["front-left", "front-right", "rear-left", "rear-right"]) {
      const rows = within(screen.getByTestId(`position-table-${pos}`)).getAllByRole("row");
      expect(rows).toHaveLength(4); // header + today + two options
    }
    const cards = screen.getAllByTestId("option-card");
    expect(cards).toHaveLength(3);
    const wider = cards.find((c) => within(c).queryByRole("heading", { name: "Wider front" }))!;
    const arms = cards.find((c) => within(c).queryByRole("heading", { name: "Longer arms" }))!;
    expect(within(wider).getByText(/machine maker's track settings/)).toBeTruthy();
    expect(within(arms).queryByText(/machine maker's track settings/)).toBeNull();
    for (const reason of result.options[1]!.reasons)
      expect(within(wider).getByText(reason)).toBeTruthy();
    // Money carries its currency.
    expect(within(arms).getAllByText(/€/).length).toBeGreaterThan(0);
    expect(screen.getByText("Estimates only: not load, pressure or speed advice")).toBeTruthy();
    expect(screen.getAllByRole("img").length).toBeGreaterThanOrEqual(3);
  });

  it("prepares a quote report from the comparison and opens it", async () => {
    const fetchMock = vi.fn(
      async () => new Response(JSON.stringify({ id: "rep-1" }), { status: 201 }),
    );
    vi.stubGlobal("fetch", fetchMock);
    wrap(<ComparisonView id={dto.id} system="metric" currency="EUR" canRun canShare />, (qc) =>
      qc.setQueryData(studyKeys.detail("comparison", dto.id), dto),
    );
    fireEvent.click(screen.getByRole("button", { name: "Prepare a quote report" }));
    await waitFor(() => expect(push).toHaveBeenCalledWith("/reports/rep-1"));
    // The page also asks for the other versions of the comparison; the report is one POST.
    const calls = fetchMock.mock.calls as unknown as [string, RequestInit | undefined][];
    const posts = calls.filter(([, init]) => init?.method === "POST");
    expect(posts.map(([url]) => url)).toEqual(["/api/v1/reports"]);
    expect(JSON.parse(String(posts[0]![1]!.body))).toEqual({ comparisonId: dto.id });
  });

  it("shows the API's words when the report cannot be prepared", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(
        async () =>
          new Response(
            JSON.stringify({
              error: { code: "allowance_used", message: "This month's reports are used up." },
            }),
            { status: 402 },
          ),
      ),
    );
    wrap(<ComparisonView id={dto.id} system="metric" currency="EUR" canRun canShare />, (qc) =>
      qc.setQueryData(studyKeys.detail("comparison", dto.id), dto),
    );
    fireEvent.click(screen.getByRole("button", { name: "Prepare a quote report" }));
    expect((await screen.findByTestId("report-error")).textContent).toBe(
      "This month's reports are used up.",
    );
    expect(push).not.toHaveBeenCalled();
  });

  it("hides running and sharing from a role that may not", () => {
    wrap(
      <ComparisonView id={dto.id} system="metric" currency="EUR" canRun={false} canShare={false} />,
      (qc) => qc.setQueryData(studyKeys.detail("comparison", dto.id), dto),
    );
    expect(screen.queryByRole("button", { name: "Prepare a quote report" })).toBeNull();
    expect(screen.queryByRole("button", { name: "Rerun as a new version" })).toBeNull();
  });
});

describe("sweep page", () => {
  it("marks today's and the best value and lists unusable values as such, in imperial units", () => {
    const values = Array.from({ length: 9 }, (_, i) => 1.6 + i * 0.1);
    const sweep = sweepParameter(demo.machine, duty, {
      parameter: "frontTrack",
      values,
      limits: { max: 2.1 },
    });
    const s: TSweepDto = {
      ...row,
      id: "7a0b9c1a-8a57-4d0e-9c3f-0a1b2c3d4e5f",
      kind: "sweep",
      title: "Tractor: front track",
      currentCostPerHour: sweep.current.costPerHour,
      bestCostPerHour: sweep.best?.costPerHour ?? null,
      result: sweep,
    };
    wrap(<SweepView id={s.id} system="imperial" currency="GBP" canRun />, (qc) =>
      qc.setQueryData(studyKeys.detail("sweep", s.id), s),
    );
    const rows = within(screen.getByTestId("sweep-table")).getAllByRole("row").slice(1);
    expect(rows).toHaveLength(9);
    // 2.2 m is outside the declared limit: shown, marked not usable.
    expect(rows[6]!.textContent).toMatch(/no: .*outside the declared limits/);
    expect(screen.getByText(/Front track \(in\)/, { selector: "th" })).toBeTruthy();
    expect(screen.getByTestId("sweep-best").textContent).toMatch(/ in$/);
    expect(screen.getAllByTestId("sweep-caution")).toHaveLength(1);
  });
});
