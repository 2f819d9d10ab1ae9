// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, fireEvent, render, screen, waitFor } from "@testing-library/react";
import { AppRouterContext } from "next/dist/shared/lib/app-router-context.shared-runtime";
import type { ReactNode } from "react";
import { afterEach, describe, expect, it } from "vitest";
import { MachineForm } from "@/features/machines/components/machine-form/machine-form";

// The form navigates after saving; the App Router context needs some router to read from.
const router = {
  push: () => {},
  replace: () => {},
  refresh: () => {},
  back: () => {},
  forward: () => {},
  prefetch: () => {},
};

function wrap(ui: ReactNode) {
  const client = new QueryClient();
  return render(
    <AppRouterContext.Provider value={router as never}>
      <QueryClientProvider client={client}>{ui}</QueryClientProvider>
    </AppRouterContext.Provider>,
  );
}

const customers = [{ id: "7f1c7a5e-1d1e-4c59-9a52-2f7c62f1b1a1", name: "Hollow Lane Farm" }];

afterEach(cleanup);

describe("machine form", () => {
  it("shows imperial units and converts the starting values (2.7 m wheelbase = 106.299 in)", () => {
    wrap(<MachineForm customers={customers} system="imperial" />);
    const wheelbase = screen.getByLabelText(/^Wheelbase/) as HTMLInputElement;
    expect(screen.getByText("Wheelbase").parentElement?.textContent).toContain("(in)");
    expect(Number(wheelbase.value)).toBeCloseTo(106.299, 3);
    expect(screen.getAllByText(/Axle load, empty/)[0]!.parentElement?.textContent).toContain(
      "(lb)",
    );
  });

  it("asks for the linkage measurements only for a track-rod layout", () => {
    wrap(<MachineForm customers={customers} system="metric" />);
    expect(screen.getByLabelText(/^Steering arm length/)).toBeTruthy();
    // Pivot track only on the steered front axle.
    expect(screen.getAllByLabelText(/^Steering pivot track/)).toHaveLength(1);

    fireEvent.change(screen.getByLabelText(/^Steering layout/), {
      target: { value: "articulated" },
    });
    expect(screen.queryByLabelText(/^Steering arm length/)).toBeNull();
    expect(screen.queryByLabelText(/^Wheelbase/)).toBeNull();
    expect(screen.getByLabelText(/^Hinge to front axle/)).toBeTruthy();
    expect(screen.queryAllByLabelText(/^Steering pivot track/)).toHaveLength(0);

    fireEvent.change(screen.getByLabelText(/^Steering layout/), {
      target: { value: "four-wheel" },
    });
    expect(screen.getAllByLabelText(/^Steering pivot track/)).toHaveLength(2);
    expect(screen.getByLabelText(/^Rear-to-front steer ratio/)).toBeTruthy();

    fireEvent.change(screen.getByLabelText(/^Steering layout/), { target: { value: "skid" } });
    expect(screen.queryByLabelText(/^Full-lock angle/)).toBeNull();
    expect(screen.getByLabelText(/^Running gear/)).toBeTruthy();
  });

  it("validates as the user types, in the user's units", async () => {
    wrap(<MachineForm customers={customers} system="imperial" />);
    fireEvent.change(screen.getByLabelText(/^Wheelbase/), { target: { value: "1000" } });
    await waitFor(() => expect(screen.getByText("Must be at most 590.55 in.")).toBeTruthy());
    fireEvent.change(screen.getByLabelText(/^Wheelbase/), { target: { value: "110" } });
    await waitFor(() => expect(screen.queryByText("Must be at most 590.55 in.")).toBeNull());
  });

  it("reads the tyre size back as dimensions while typing, and says what is wrong with a bad one", async () => {
    wrap(<MachineForm customers={customers} system="metric" />);
    const [front] = screen.getAllByLabelText(/^Tyre size/);
    fireEvent.change(front!, { target: { value: "480/70R28" } });
    // 480 × 0.70 × 2 + 28 × 25.4 = 1383.2 mm (ISO 4251-1 designation convention).
    await waitFor(() =>
      expect(
        screen.getByText(/Reads as 480 mm wide, 70 % series, 28 in rim, about 1,383 mm/),
      ).toBeTruthy(),
    );
    fireEvent.change(front!, { target: { value: "480/70X" } });
    await waitFor(() => expect(screen.getByText(/Tyre designation "480\/70X"/)).toBeTruthy());
  });

  it("draws the geometry once the machine is valid", async () => {
    wrap(<MachineForm customers={customers} system="metric" />);
    expect(screen.getByText(/Fill in the highlighted fields/)).toBeTruthy();
    fireEvent.change(screen.getByLabelText(/^Name/), { target: { value: "Yard tractor" } });
    const sizes = screen.getAllByLabelText(/^Tyre size/);
    fireEvent.change(sizes[0]!, { target: { value: "380/85R24" } });
    fireEvent.change(sizes[1]!, { target: { value: "460/85R34" } });
    await waitFor(() => expect(screen.getByTestId("geometry-view")).toBeTruthy());
    expect(screen.getByTestId("percent-ackermann").textContent).toMatch(/%$/);
    expect(screen.getByTestId("full-lock-diameter").textContent).toMatch(/^\d+(\.\d)? m$/);
  });
});
