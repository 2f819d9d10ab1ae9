import { getDb } from "@/db/client";
import { getHealth } from "@/features/platform/server/get-health";
import { getEnv } from "@/lib/env";

export const dynamic = "force-dynamic";

// Public by design: reports only the version and whether the database answers.
export async function GET() {
  const health = await getHealth({ db: getDb(), version: getEnv().APP_VERSION });
  return Response.json(health, {
    status: health.database === "up" ? 200 : 503,
    headers: { "cache-control": "no-store" },
  });
}
