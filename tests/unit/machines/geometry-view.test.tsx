// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { ZMachine } from "@/lib/scrub";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { GeometryView } from "@/features/machines/components/geometry/geometry-view";

afterEach(cleanup);

const telehandler = ZMachine.parse(DEMO_MACHINES.find((m) => m.id === "telehandler")!.machine);

describe("geometry view", () => {
  it("shows one steering mode at a time for a machine with several", () => {
    expect(telehandler.otherSteeringModes.map((m) => m.layout)).toContain("crab");
    render(<GeometryView machine={telehandler} system="metric" />);
    expect(screen.getByTestId("percent-ackermann")).toBeTruthy();
    fireEvent.change(screen.getByLabelText("Steering mode shown"), { target: { value: "crab" } });
    expect(screen.queryByTestId("percent-ackermann")).toBeNull();
    expect(screen.getByText(/Travels sideways-on/)).toBeTruthy();
    expect(screen.getByTestId("full-lock-diameter").textContent).toBe("—");
  });

  it("moves the steer input with the slider and reports the turning diameter in feet for imperial users", () => {
    render(<GeometryView machine={telehandler} system="imperial" />);
    const before = screen.getByTestId("turning-diameter").textContent;
    fireEvent.change(screen.getByRole("slider"), { target: { value: "1" } });
    const after = screen.getByTestId("turning-diameter").textContent;
    expect(after).toMatch(/ ft$/);
    expect(after).not.toBe(before);
  });
});
