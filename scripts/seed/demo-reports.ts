// One issued and shared quote report in the invented scenario, so the customer portal of the
// demo farm has something to read: built from the row-crop tractor's prepared comparison
// through the same server verbs as the screens. Idempotent: a comparison that already has a
// report is left alone.
import { and, eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { machines, optionStudies, reports, type TDealership } from "@/db/schema";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { createReport } from "@/features/reports/server/create-report";
import { updateReport } from "@/features/reports/server/update-report";
import { issueReport } from "@/features/reports/server/issue-report";
import { shareReport } from "@/features/reports/server/share-report";
import { seedActor } from "@/scripts/seed/seed-actor";

const MACHINE = DEMO_MACHINES.find((d) => d.id === "row-crop-tractor")!.machine.name;

export async function seedDemoReports(
  db: Db,
  { dealership, estimatorEmail }: { dealership: TDealership; estimatorEmail: string },
) {
  const actor = await seedActor(db, { email: estimatorEmail, role: "estimator", dealership });
  const [study] = await db
    .select({ id: optionStudies.id })
    .from(optionStudies)
    .innerJoin(machines, eq(machines.id, optionStudies.machineId))
    .where(
      and(
        eq(machines.dealershipId, dealership.id),
        eq(machines.name, MACHINE),
        eq(optionStudies.kind, "comparison"),
      ),
    )
    .limit(1);
  if (!study) return { added: 0 };
  const [done] = await db
    .select({ id: reports.id })
    .from(reports)
    .where(eq(reports.comparisonId, study.id))
    .limit(1);
  if (done) return { added: 0 };

  const draft = await createReport({ db, actor, input: { comparisonId: study.id } });
  await updateReport({
    db,
    actor,
    id: draft.id,
    input: {
      recommendations:
        "Less front-axle lead and the assist left off through headland turns cost little and " +
        "take the most scrub off the front tyres. Fit the deeper-tread set at the next change " +
        "only if the tractor stays on this farm's road work.",
      customerNote:
        "Figures are estimates from your spring duty cycle; we can check them at the next service.",
    },
  });
  await issueReport({ db, actor, id: draft.id });
  // Seeding sends no mail: the farm's account simply finds the report in its portal.
  await shareReport({ db, mailer: { send: async () => {} }, actor, id: draft.id, input: {} });
  return { added: 1 };
}
