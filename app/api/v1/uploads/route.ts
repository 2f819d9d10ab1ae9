import { getDb } from "@/db/client";
import { getEnv } from "@/lib/env";
import { withActor } from "@/app/api/_lib/with-actor";
import { respond } from "@/features/duty-cycles/server/respond";
import { createUpload } from "@/features/duty-cycles/server/create-upload";

export const dynamic = "force-dynamic";

/** The raw file as the body (streamed to storage); its name in the x-file-name header. */
export const POST = withActor(({ req, actor }) =>
  respond(() => {
    const length = req.headers.get("content-length");
    return createUpload({
      db: getDb(),
      actor,
      body: req.body,
      fileName: req.headers.get("x-file-name"),
      contentLength: length ? Number(length) : null,
      limit: getEnv().UPLOAD_LIMIT_BYTES,
    });
  }, 201),
);
