// Allowance rules from the billing issue (common practice for metered plans, no outside source).
import { describe, expect, it } from "vitest";
import {
  calendarMonth,
  decideAllowance,
  PAST_DUE_GRACE_DAYS,
  type TAllowanceInput,
} from "@/lib/billing/allowance";
import { formatMoney } from "@/lib/billing/money";

const now = new Date("2026-12-02T12:00:00Z");
const monthly = {
  key: "m",
  name: "M",
  kind: "monthly" as const,
  includedReports: 25,
  overageMinor: 250,
};
const hard = { ...monthly, overageMinor: null };
const base: TAllowanceInput = {
  status: "active",
  plan: monthly,
  trialStartedAt: null,
  trialEndsAt: null,
  currentPeriodEnd: null,
  pastDueSince: null,
  packCredits: 0,
  usedInPeriod: 0,
  now,
};

describe("decideAllowance", () => {
  it("counts included reports, then bundle credit, then overage", () => {
    expect(decideAllowance({ ...base, usedInPeriod: 24 })).toEqual({
      ok: true,
      source: "included",
    });
    expect(decideAllowance({ ...base, usedInPeriod: 25, packCredits: 1 })).toEqual({
      ok: true,
      source: "pack",
    });
    expect(decideAllowance({ ...base, usedInPeriod: 25 })).toEqual({ ok: true, source: "overage" });
  });
  it("a hard quota blocks at the limit", () => {
    expect(decideAllowance({ ...base, plan: hard, usedInPeriod: 25 })).toEqual({
      ok: false,
      code: "quota_reached",
    });
  });
  it("a trial allows its included reports until it ends, then no plan", () => {
    const trial = {
      ...base,
      status: "trialing" as const,
      plan: { ...hard, kind: "trial" as const, includedReports: 10 },
      trialStartedAt: new Date("2026-11-25Z"),
      trialEndsAt: new Date("2026-12-09Z"),
    };
    expect(decideAllowance({ ...trial, usedInPeriod: 9 }).ok).toBe(true);
    expect(decideAllowance({ ...trial, usedInPeriod: 10 })).toEqual({
      ok: false,
      code: "quota_reached",
    });
    expect(decideAllowance({ ...trial, now: new Date("2026-12-10Z") })).toEqual({
      ok: false,
      code: "no_plan",
    });
  });
  it(`past due keeps issuing for ${PAST_DUE_GRACE_DAYS} days, then blocks`, () => {
    const pd = { ...base, status: "past_due" as const };
    expect(decideAllowance({ ...pd, pastDueSince: new Date("2026-11-28T12:00:00Z") }).ok).toBe(
      true,
    );
    expect(decideAllowance({ ...pd, pastDueSince: new Date("2026-11-25T12:00:00Z") })).toEqual({
      ok: false,
      code: "past_due_expired",
    });
  });
  it("cancelled blocks unless bundle credit remains", () => {
    expect(decideAllowance({ ...base, status: "cancelled" })).toEqual({
      ok: false,
      code: "cancelled",
    });
    expect(decideAllowance({ ...base, status: "cancelled", packCredits: 2 })).toEqual({
      ok: true,
      source: "pack",
    });
  });
  it("no plan with no credit is no_plan", () => {
    expect(decideAllowance({ ...base, status: "none", plan: null })).toEqual({
      ok: false,
      code: "no_plan",
    });
  });
});

describe("calendarMonth", () => {
  it("spans the UTC month, across a year end", () => {
    expect(calendarMonth(new Date("2026-12-31T23:59:59Z"))).toEqual({
      start: new Date("2026-12-01T00:00:00Z"),
      end: new Date("2027-01-01T00:00:00Z"),
    });
  });
});

describe("formatMoney", () => {
  it("always shows the currency (ISO 4217 minor units: GBP and EUR have 2)", () => {
    expect(formatMoney(3900, "gbp")).toBe("£39.00");
    expect(formatMoney(250, "eur")).toBe("€2.50");
  });
});
