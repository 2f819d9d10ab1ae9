import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { pathId, respond } from "@/features/calibration/server/respond";
import { getReadingPhoto } from "@/features/calibration/server/get-reading-photo";

export const GET = withActor(async ({ actor, params }) => {
  let photo: Awaited<ReturnType<typeof getReadingPhoto>> | undefined;
  // respond() turns a refusal into the API's JSON error; the image itself is sent as bytes.
  const refusal = await respond(async () => {
    photo = await getReadingPhoto({ db: getDb(), actor, id: pathId(params.id, "photo") });
    return null;
  });
  if (!photo) return refusal;
  return new Response(new Uint8Array(photo.bytes), {
    headers: {
      "content-type": photo.contentType,
      "cache-control": "private, max-age=3600",
      "x-content-type-options": "nosniff",
    },
  });
});
