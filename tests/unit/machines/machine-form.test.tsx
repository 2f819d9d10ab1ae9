// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import { AppRouterContext } from "next/dist/shared/lib/app-router-context.shared-runtime";
import type { ReactNode } from "react";
import { afterEach, describe, expect, it } from "vitest";
import { profileChecks, type TMachineInput } from "@/lib/scrub";
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

// Invented tractor for the edit form.
const TRACTOR: TMachineInput = {
  name: "Yard tractor",
  wheelbase: 2.7,
  axles: {
    front: {
      track: 1.9,
      load: 2800,
      tyre: { designation: "380/85R24", treadDepthNew: 40, treadDepthReplace: 10, price: 1200 },
    },
    rear: {
      track: 1.9,
      load: 4200,
      tyre: { designation: "460/85R34", treadDepthNew: 50, treadDepthReplace: 12, price: 2000 },
    },
  },
  steering: { layout: "trapezoid", maxLock: 52, armLength: 0.2, armAngle: 16, tieRod: "behind" },
  drive: { type: "front-assist", gearRatio: 1.3 },
};

afterEach(cleanup);

describe("machine form", () => {
  it("starts a new machine blank: no invented wheelbase, tracks, loads, depths, prices or gear ratio", () => {
    wrap(<MachineForm customers={customers} system="imperial" />);
    expect(screen.getByText("Wheelbase").parentElement?.textContent).toContain("(in)");
    expect(screen.getAllByText(/Axle load, empty/)[0]!.parentElement?.textContent).toContain(
      "(lb)",
    );
    for (const label of [
      /^Wheelbase/,
      /^Track(?! rod)/,
      /^Axle load, empty/,
      /^Lug depth, new/,
      /^Lug depth at replacement/,
      /^Price per tyre/,
      /^Front axle gear ratio/,
    ]) {
      for (const input of screen.getAllByLabelText(label) as HTMLInputElement[])
        expect(input.value, String(label)).toBe("");
    }
  });

  it("converts a stored machine's figures to the user's units (2.7 m wheelbase = 106.299 in)", () => {
    wrap(
      <MachineForm
        customers={customers}
        system="imperial"
        machine={{
          id: "0c6f0b7e-8d1a-4c3b-9e1f-6a2b3c4d5e6f",
          customerId: null,
          customerName: null,
          name: "Yard tractor",
          kind: "tractor",
          layout: "trapezoid",
          spec: TRACTOR,
          templateId: null,
          version: 1,
          createdAt: "2026-12-01T09:00:00.000Z",
          updatedAt: "2026-12-01T09:00:00.000Z",
        }}
      />,
    );
    // 1 in = 0.0254 m exactly (NIST SP 811, Appendix B).
    expect(Number((screen.getByLabelText(/^Wheelbase/) as HTMLInputElement).value)).toBeCloseTo(
      106.299,
      3,
    );
  });

  it("refuses to save without the real loads and prices, saying which are missing", async () => {
    wrap(<MachineForm customers={customers} system="metric" />);
    fireEvent.change(screen.getByLabelText(/^Name/), { target: { value: "Yard tractor" } });
    fireEvent.click(screen.getByRole("button", { name: "Add machine" }));
    await waitFor(() =>
      expect(
        screen.getByText("Some fields need fixing before the machine can be saved."),
      ).toBeTruthy(),
    );
    const field = (label: RegExp, i = 0) =>
      screen.getAllByLabelText(label)[i]!.closest("div")!.parentElement!.textContent;
    expect(field(/^Axle load, empty/)).toContain("Required: enter a value.");
    expect(field(/^Axle load, empty/, 1)).toContain("Required: enter a value.");
    expect(field(/^Price per tyre/)).toContain("Required: enter a value.");
  });

  it("shows the front-axle lead live from the gear ratio and tyre sizes, with the engine's band warning", async () => {
    wrap(<MachineForm customers={customers} system="metric" />);
    expect(screen.getByTestId("lead-check").textContent).toMatch(/enter both tyre sizes/);
    const sizes = screen.getAllByLabelText(/^Tyre size/);
    fireEvent.change(sizes[0]!, { target: { value: "420/85R24" } });
    fireEvent.change(sizes[1]!, { target: { value: "520/85R38" } });
    fireEvent.change(screen.getByLabelText(/^Front axle gear ratio/), { target: { value: "1.3" } });
    // Lead definition (common practice, no source): λ = (RC_front · ratio − RC_rear)/RC_rear,
    // rolling circumferences from the nominal diameters of the ISO 4251-1 designations.
    const expected = profileChecks({
      drive: { type: "front-assist", gearRatio: 1.3 },
      axles: {
        front: { tyre: { designation: "420/85R24" } },
        rear: { tyre: { designation: "520/85R38" } },
      },
    });
    const text = `−${Math.abs(expected.lead! * 100).toFixed(1)} %`;
    await waitFor(() => expect(screen.getByTestId("lead-check").textContent).toContain(text));
    expect(expected.lead!).toBeLessThan(-0.05);
    expect(screen.getByTestId("lead-warning").textContent).toBe(expected.leadWarning!.message);
    // A ratio that brings the lead into the 1–5 % band clears the warning.
    fireEvent.change(screen.getByLabelText(/^Front axle gear ratio/), {
      target: { value: "1.43" },
    });
    await waitFor(() => expect(screen.queryByTestId("lead-warning")).toBeNull());
  });

  it("warns beside the axle when the load per tyre exceeds the tyres' declared capacity", async () => {
    wrap(<MachineForm customers={customers} system="metric" />);
    const front = within(screen.getByTestId("axle-front"));
    fireEvent.change(front.getByLabelText(/^Axle load, empty/), { target: { value: "3600" } });
    expect(screen.queryByTestId("capacity-check-front")).toBeNull();
    fireEvent.change(front.getByLabelText(/^Tyre load capacity/), { target: { value: "1500" } });
    await waitFor(() =>
      expect(front.getByTestId("capacity-check-front").textContent).toMatch(
        /^front axle \(unladen\): 1,800 kg per tyre exceeds the declared 1,500 kg capacity/,
      ),
    );
    expect(screen.queryByTestId("capacity-check-rear")).toBeNull();
    fireEvent.change(front.getByLabelText(/^Tyre load capacity/), { target: { value: "1900" } });
    await waitFor(() => expect(screen.queryByTestId("capacity-check-front")).toBeNull());
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
    fireEvent.change(screen.getByLabelText(/^Wheelbase/), { target: { value: "2.7" } });
    fireEvent.change(screen.getByLabelText(/^Front axle gear ratio/), { target: { value: "1.3" } });
    for (const [axle, values] of [
      [
        "front",
        {
          track: "1.9",
          load: "2800",
          size: "380/85R24",
          depth: "40",
          replace: "10",
          price: "1200",
        },
      ],
      [
        "rear",
        {
          track: "1.9",
          load: "4200",
          size: "460/85R34",
          depth: "50",
          replace: "12",
          price: "2000",
        },
      ],
    ] as const) {
      const fields = within(screen.getByTestId(`axle-${axle}`));
      const set = (label: RegExp, value: string) =>
        fireEvent.change(fields.getByLabelText(label), { target: { value } });
      set(/^Track(?! rod)/, values.track);
      set(/^Axle load, empty/, values.load);
      set(/^Tyre size/, values.size);
      set(/^Lug depth, new/, values.depth);
      set(/^Lug depth at replacement/, values.replace);
      set(/^Price per tyre/, values.price);
    }
    await waitFor(() => expect(screen.getByTestId("geometry-view")).toBeTruthy());
    expect(screen.getByTestId("percent-ackermann").textContent).toMatch(/%$/);
    expect(screen.getByTestId("full-lock-diameter").textContent).toMatch(/^\d+(\.\d)? m$/);
  });
});
