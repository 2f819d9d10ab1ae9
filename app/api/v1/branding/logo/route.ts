import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { respond } from "@/features/platform";
import { getLogo } from "@/features/reports/server/get-logo";
import { uploadLogo } from "@/features/reports/server/upload-logo";

/** The current logo, as re-encoded on upload. */
export const GET = withActor(async ({ actor }) => {
  let logo: { bytes: Buffer; mime: string } | undefined;
  const refusal = await respond(async () => {
    logo = await getLogo({ db: getDb(), actor });
    return null;
  });
  if (!logo) return refusal;
  return new Response(new Uint8Array(logo.bytes), {
    headers: { "content-type": logo.mime, "cache-control": "private, no-store" },
  });
});

/** Raw image bytes as the body (or a multipart form with a "logo" file). */
export const POST = withActor(({ req, actor }) =>
  respond(async () => {
    const type = req.headers.get("content-type") ?? "";
    let bytes: Uint8Array;
    if (type.startsWith("multipart/form-data")) {
      const file = (await req.formData()).get("logo");
      bytes = file instanceof Blob ? new Uint8Array(await file.arrayBuffer()) : new Uint8Array();
    } else bytes = new Uint8Array(await req.arrayBuffer());
    return uploadLogo({ db: getDb(), actor, bytes });
  }),
);
