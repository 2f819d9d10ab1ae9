import "server-only";
import { notFound, redirect } from "next/navigation";
import { getDb } from "@/db/client";
import { getActor } from "@/features/auth";
import { ApiError, isUuid } from "@/features/platform";
import { can } from "@/lib/authz/policy";
import { readSetupBase } from "./read-setup-base";

/**
 * What the "try another setup" and "sweep a setting" pages start from: the signed-in estimator
 * and the estimate's machine as run today. Sends anyone else away and answers 404 for an
 * estimate outside the dealership.
 */
export async function loadSetupPage(estimateId: string) {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  if (!can(actor, "estimate:run")) redirect(`/estimates/${estimateId}`);
  if (!isUuid(estimateId)) notFound();
  const base = await readSetupBase({ db: getDb(), actor, estimateId }).catch((e: unknown) => {
    if (e instanceof ApiError && e.status === 404) return null;
    throw e;
  });
  if (!base) notFound();
  return { actor, base };
}
