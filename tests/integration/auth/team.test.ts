import { afterAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { getDb, getPool } from "@/db/client";
import { auditEvents, memberships } from "@/db/schema";
import { getActorFromRequest } from "@/features/auth/server/get-actor";
import { listAuditEvents } from "@/features/auth/server/list-audit-events";
import {
  listMembers,
  removeMember,
  revokeInvitation,
  setMemberRoles,
} from "@/features/auth/server/team";
import { createTestMember, requestAs } from "@/tests/support/session";

const db = getDb();
afterAll(async () => {
  await getPool().end();
});

describe("team management", () => {
  it("the last dealer admin cannot remove themself or give up the role", async () => {
    const admin = await createTestMember({ db, roles: ["dealer_admin"] });
    const removed = await removeMember({ db, actor: admin.actor, userId: admin.user.id });
    expect(removed).toMatchObject({ ok: false, code: "conflict" });
    expect(removed.message).toMatch(/last dealer admin/);
    const demoted = await setMemberRoles({
      db,
      actor: admin.actor,
      userId: admin.user.id,
      roles: ["estimator"],
    });
    expect(demoted).toMatchObject({ ok: false, code: "conflict" });
    expect(await getActorFromRequest(requestAs(admin.cookie, "/x"))).toMatchObject({
      roles: ["dealer_admin"],
    });
  });

  it("with a second admin, an admin may step down; role changes are audited", async () => {
    const a = await createTestMember({ db, roles: ["dealer_admin"] });
    const b = await createTestMember({ db, roles: ["estimator"], dealershipId: a.dealership.id });
    expect(
      await setMemberRoles({
        db,
        actor: a.actor,
        userId: b.user.id,
        roles: ["dealer_admin", "billing_admin"],
      }),
    ).toMatchObject({ ok: true });
    expect((await getActorFromRequest(requestAs(b.cookie, "/x")))?.roles.sort()).toEqual([
      "billing_admin",
      "dealer_admin",
    ]);
    expect(await removeMember({ db, actor: a.actor, userId: a.user.id })).toMatchObject({
      ok: true,
    });
    // Removal takes effect on the very next request, with the same cookie.
    expect(await getActorFromRequest(requestAs(a.cookie, "/x"))).toBeNull();
    const kinds = (
      await db.select().from(auditEvents).where(eq(auditEvents.dealershipId, a.dealership.id))
    ).map((e) => e.kind);
    expect(kinds).toEqual(expect.arrayContaining(["role_changed", "member_removed"]));
  });

  it("staff other than dealer admins cannot change roles, remove people or read the audit log", async () => {
    const admin = await createTestMember({ db, roles: ["dealer_admin"] });
    for (const role of ["estimator", "billing_admin", "customer"] as const) {
      const m = await createTestMember({ db, roles: [role], dealershipId: admin.dealership.id });
      expect(await removeMember({ db, actor: m.actor, userId: admin.user.id })).toMatchObject({
        code: "forbidden",
      });
      expect(
        await setMemberRoles({ db, actor: m.actor, userId: m.user.id, roles: ["dealer_admin"] }),
      ).toMatchObject({ code: "forbidden" });
      expect(await listMembers(db, m.actor)).toBeNull();
      expect(await listAuditEvents(db, m.actor)).toBeNull();
    }
    const rows = await db
      .select()
      .from(memberships)
      .where(
        and(
          eq(memberships.dealershipId, admin.dealership.id),
          eq(memberships.role, "dealer_admin"),
        ),
      );
    expect(rows).toHaveLength(1);
  });

  it("an admin of another dealership cannot touch this dealership's members", async () => {
    const home = await createTestMember({ db, roles: ["dealer_admin"] });
    const staff = await createTestMember({
      db,
      roles: ["estimator"],
      dealershipId: home.dealership.id,
    });
    const rival = await createTestMember({ db, roles: ["dealer_admin"] });
    expect(await removeMember({ db, actor: rival.actor, userId: staff.user.id })).toMatchObject({
      code: "not_found",
    });
    expect(
      await setMemberRoles({
        db,
        actor: rival.actor,
        userId: staff.user.id,
        roles: ["dealer_admin"],
      }),
    ).toMatchObject({ code: "not_found" });
    expect(await getActorFromRequest(requestAs(staff.cookie, "/x"))).toMatchObject({
      dealershipId: home.dealership.id,
      roles: ["estimator"],
    });
    const members = await listMembers(db, rival.actor);
    expect(members?.map((m) => m.userId)).toEqual([rival.user.id]);
    expect(
      await revokeInvitation({ db, actor: rival.actor, invitationId: crypto.randomUUID() }),
    ).toMatchObject({ code: "not_found" });
  });

  it("a customer account keeps its customer role", async () => {
    const admin = await createTestMember({ db, roles: ["dealer_admin"] });
    const cust = await createTestMember({
      db,
      roles: ["customer"],
      dealershipId: admin.dealership.id,
    });
    expect(
      await setMemberRoles({ db, actor: admin.actor, userId: cust.user.id, roles: ["estimator"] }),
    ).toMatchObject({ ok: false, code: "conflict" });
  });
});
