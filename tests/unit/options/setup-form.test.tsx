// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import { AppRouterContext } from "next/dist/shared/lib/app-router-context.shared-runtime";
import { afterEach, describe, expect, it, vi } from "vitest";
import { ZMachine } from "@/lib/scrub";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { SetupForm } from "@/features/options/components/setup-form";

const push = vi.fn();
const router = {
  push,
  replace: () => {},
  refresh: () => {},
  back: () => {},
  forward: () => {},
  prefetch: () => {},
};
const machine = ZMachine.parse(DEMO_MACHINES.find((m) => m.id === "row-crop-tractor")!.machine);
const estimateId = "0b8f1e5a-4a6e-4a8e-9a6e-2f1f0c1d2e3f";

function show() {
  return render(
    <AppRouterContext.Provider value={router as never}>
      <QueryClientProvider client={new QueryClient()}>
        <SetupForm estimateId={estimateId} machine={machine} system="imperial" currency="GBP" />
      </QueryClientProvider>
    </AppRouterContext.Provider>,
  );
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  push.mockReset();
});

describe("try another setup form", () => {
  it("sends two named options with their costs and changes in SI, then opens the comparison", async () => {
    const fetchMock = vi.fn(
      async () =>
        new Response(JSON.stringify({ id: "cmp-1", kind: "comparison" }), { status: 201 }),
    );
    vi.stubGlobal("fetch", fetchMock);
    show();
    const first = screen.getByTestId("option-1");
    fireEvent.change(within(first).getByLabelText("Name"), { target: { value: "Wider front" } });
    fireEvent.change(within(first).getByLabelText(/One-off cost/), { target: { value: "850" } });
    fireEvent.change(within(first).getByLabelText("What to change"), {
      target: { value: "parameter:frontTrack" },
    });
    fireEvent.change(within(first).getByLabelText(/Front track/), { target: { value: "78" } });
    // The track caution appears beside the option as it is built.
    expect(within(first).getByText(/machine maker's track settings/)).toBeTruthy();
    const second = screen.getByTestId("option-2");
    fireEvent.change(within(second).getByLabelText("Name"), { target: { value: "More ballast" } });
    fireEvent.change(within(second).getByLabelText("What to change"), {
      target: { value: "ballast" },
    });
    fireEvent.change(within(second).getByLabelText(/Rear ballast/), { target: { value: "1000" } });
    fireEvent.click(screen.getByRole("button", { name: "Compare with today's setup" }));
    await waitFor(() => expect(push).toHaveBeenCalledWith("/comparisons/cmp-1"));
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe("/api/v1/comparisons");
    const body = JSON.parse(String(init.body));
    expect(body).toMatchObject({ estimateId, hours: 2000 });
    expect(body.options).toHaveLength(2);
    expect(body.options[0]).toMatchObject({ name: "Wider front", oneOffCost: 850 });
    // 78 in × 0.0254 m/in (NIST SP 811, exact).
    expect(body.options[0].changes[0].value).toBeCloseTo(1.9812, 9);
    expect(body.options[1].changes[0]).toMatchObject({ kind: "ballast" });
    // 1000 lb × 0.45359237 kg/lb (NIST SP 811, exact).
    expect(body.options[1].changes[0].rear).toBeCloseTo(453.59237, 6);
  });

  it("says what to fix and sends nothing when a name or a value is missing", async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal("fetch", fetchMock);
    show();
    const first = screen.getByTestId("option-1");
    fireEvent.change(within(first).getByLabelText("Name"), { target: { value: "" } });
    fireEvent.change(within(first).getByLabelText("What to change"), {
      target: { value: "parameter:rearTrack" },
    });
    fireEvent.change(within(first).getByLabelText(/Rear track/), { target: { value: "wide" } });
    fireEvent.click(screen.getByRole("button", { name: "Compare with today's setup" }));
    expect(await within(first).findByText(/Give the option a name/)).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
    // Names fixed, the value is still wrong: the change's own check speaks.
    fireEvent.change(within(first).getByLabelText("Name"), { target: { value: "Narrow rear" } });
    fireEvent.click(screen.getByRole("button", { name: "Compare with today's setup" }));
    expect(await within(first).findByText(/Enter a number for the new setting/)).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });
});
