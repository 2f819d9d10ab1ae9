import { notFound, redirect } from "next/navigation";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { getDb } from "@/db/client";
import { getActor } from "@/features/auth/server/get-actor";
import { isUuid } from "@/features/platform";
import { CalibrationError } from "@/features/calibration/server/errors";
import { calibrationKeys } from "@/features/calibration/api/calibration";
import { TreadWorkbench } from "@/features/calibration/components/tread-workbench";
import { getMachineCalibration } from "@/features/calibration/server/get-machine-calibration";
import { can } from "@/lib/authz/policy";
import { makeQueryClient } from "@/lib/query/query-client";

export const metadata = { title: "Tread and calibration" };

export default async function TreadPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  if (!isUuid(id)) notFound();
  const qc = makeQueryClient();
  try {
    const data = await getMachineCalibration({ db: getDb(), actor, machineId: id });
    qc.setQueryData(calibrationKeys.machine(id), data);
  } catch (e) {
    if (e instanceof CalibrationError && e.status === 404) notFound();
    throw e;
  }
  return (
    <HydrationBoundary state={dehydrate(qc)}>
      <TreadWorkbench
        machineId={id}
        system={actor.unitSystem}
        canRun={can(actor, "estimate:run")}
        userName={actor.name ?? actor.email}
      />
    </HydrationBoundary>
  );
}
