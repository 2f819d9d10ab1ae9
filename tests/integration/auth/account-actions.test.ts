import { afterAll, describe, expect, it, vi } from "vitest";

const state = vi.hoisted(() => ({ cookie: "" }));

// Server actions read the session through next/headers, which exists only inside a Next
// request; give them the caller's real session cookie. Actors still come from PostgreSQL.
vi.mock("next/headers", () => ({
  cookies: async () => {
    const jar = new Map(
      state.cookie
        .split(";")
        .filter(Boolean)
        .map((p) => [p.slice(0, p.indexOf("=")).trim(), p.slice(p.indexOf("=") + 1)] as const),
    );
    return { getAll: () => [...jar].map(([name, value]) => ({ name, value })) };
  },
  headers: async () => new Headers({ cookie: state.cookie }),
}));
vi.mock("next/cache", async (importOriginal) => ({
  ...(await importOriginal<Record<string, unknown>>()),
  revalidatePath: () => undefined,
}));

const { getDb, getPool } = await import("@/db/client");
const { memberships } = await import("@/db/schema");
const { getActorFromRequest } = await import("@/features/auth/server/get-actor");
const { setDealershipCurrencyAction, setUnitSystemAction, switchDealershipAction } =
  await import("@/features/auth/server/actions/session-actions");
const { createTestDealership, createTestMember, requestAs } =
  await import("@/tests/support/session");

const db = getDb();
afterAll(async () => {
  await getPool().end();
});

function form(values: Record<string, string>) {
  const f = new FormData();
  for (const [k, v] of Object.entries(values)) f.set(k, v);
  return f;
}

describe("account actions", () => {
  it("lets a dealer admin set the dealership's currency, refuses others and bad codes", async () => {
    const admin = await createTestMember({ db, roles: ["dealer_admin"] });
    const estimator = await createTestMember({
      db,
      roles: ["estimator"],
      dealershipId: admin.dealership.id,
    });
    const currencyNow = async (cookie: string) =>
      (await getActorFromRequest(requestAs(cookie, "/x")))?.currency;
    expect(await currencyNow(admin.cookie)).toBe("EUR");

    state.cookie = estimator.cookie;
    const refused = await setDealershipCurrencyAction(undefined, form({ currency: "GBP" }));
    expect(refused).toMatchObject({ ok: false, code: "forbidden" });
    expect(await currencyNow(admin.cookie)).toBe("EUR");

    state.cookie = admin.cookie;
    const bad = await setDealershipCurrencyAction(undefined, form({ currency: "XQQ" }));
    expect(bad).toMatchObject({ ok: false, code: "invalid_input" });
    expect(bad.fieldErrors?.currency).toMatch(/ISO 4217/);
    expect(await currencyNow(admin.cookie)).toBe("EUR");

    const done = await setDealershipCurrencyAction(undefined, form({ currency: "gbp" }));
    expect(done.ok).toBe(true);
    // Everyone in the dealership now sees amounts in the new currency.
    expect(await currencyNow(estimator.cookie)).toBe("GBP");
  });

  it("switches the active dealership only to one the user belongs to", async () => {
    const m = await createTestMember({ db, roles: ["estimator"] });
    const second = await createTestDealership(db);
    await db
      .insert(memberships)
      .values({ dealershipId: second.id, userId: m.user.id, role: "billing_admin" });
    const stranger = await createTestDealership(db);
    state.cookie = m.cookie;

    const refused = await switchDealershipAction(undefined, form({ dealershipId: stranger.id }));
    expect(refused).toMatchObject({ ok: false, code: "not_found" });
    expect((await getActorFromRequest(requestAs(m.cookie, "/x")))?.dealershipId).toBe(
      m.dealership.id,
    );

    const done = await switchDealershipAction(undefined, form({ dealershipId: second.id }));
    expect(done.ok).toBe(true);
    const actor = await getActorFromRequest(requestAs(m.cookie, "/x"));
    expect(actor).toMatchObject({ dealershipId: second.id, roles: ["billing_admin"] });
  });

  it("stores the unit preference, and refuses a value that is not metric or imperial", async () => {
    const m = await createTestMember({ db, roles: ["customer"] });
    state.cookie = m.cookie;
    const bad = await setUnitSystemAction(undefined, form({ unitSystem: "furlongs" }));
    expect(bad).toMatchObject({ ok: false, fieldErrors: { unitSystem: expect.any(String) } });
    expect((await getActorFromRequest(requestAs(m.cookie, "/x")))?.unitSystem).toBe("metric");
    expect((await setUnitSystemAction(undefined, form({ unitSystem: "imperial" }))).ok).toBe(true);
    expect((await getActorFromRequest(requestAs(m.cookie, "/x")))?.unitSystem).toBe("imperial");
  });

  it("refuses a signed-out caller", async () => {
    state.cookie = "";
    expect(await setUnitSystemAction(undefined, form({ unitSystem: "imperial" }))).toMatchObject({
      ok: false,
      code: "unauthenticated",
    });
  });
});
