import "server-only";
import sharp, { type OutputInfo } from "sharp";
import type { DbOrTx } from "@/db/client";
import { dealershipBrandings } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import type { TBrandingDto } from "@/features/reports/schemas/report";
import { getBranding } from "@/features/reports/server/get-branding";
import { forbidden, ApiError } from "@/features/platform";

export const LOGO_MAX_BYTES = 2 * 1024 * 1024;
const LOGO_MAX_BOX = { width: 800, height: 320 };

/** PNG and JPEG by their first bytes, whatever the file is called or claims to be. */
export function sniffImage(bytes: Uint8Array): "png" | "jpeg" | null {
  const png = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
  if (bytes.length >= 8 && png.every((b, i) => bytes[i] === b)) return "png";
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff)
    return "jpeg";
  return null;
}

const refuse = (message: string) => new ApiError(400, "invalid_logo", message);

/**
 * Stores the dealership's logo: PNG or JPEG only (checked by content), at most 2 MB, decoded and
 * re-encoded as PNG on the server (metadata and anything smuggled after the image are dropped),
 * fitted inside 800 × 320 px. The logo already stored stays when the upload is refused.
 */
export async function uploadLogo({
  db,
  actor,
  bytes,
}: {
  db: DbOrTx;
  actor: TActor;
  bytes: Uint8Array;
}): Promise<TBrandingDto> {
  if (!can(actor, "staff:manage")) throw forbidden("the dealership's logo");
  if (bytes.length === 0) throw refuse("The file is empty: choose a PNG or JPEG logo.");
  if (bytes.length > LOGO_MAX_BYTES)
    throw refuse(`The logo is ${(bytes.length / 1048576).toFixed(1)} MB; the limit is 2 MB.`);
  const kind = sniffImage(bytes);
  if (!kind)
    throw refuse("That file is not a PNG or JPEG image (its content was checked, not its name).");
  let out: { data: Buffer; info: OutputInfo };
  try {
    out = await sharp(bytes, { failOn: "error", limitInputPixels: 40_000_000 })
      .rotate()
      .resize({ ...LOGO_MAX_BOX, fit: "inside", withoutEnlargement: true })
      .png({ compressionLevel: 9 })
      .toBuffer({ resolveWithObject: true });
  } catch {
    throw refuse(
      `The ${kind.toUpperCase()} file is damaged and could not be read: export it again.`,
    );
  }
  const logo = {
    logo: out.data,
    logoMime: "image/png",
    logoWidth: out.info.width,
    logoHeight: out.info.height,
    updatedById: actor.userId,
  };
  await db
    .insert(dealershipBrandings)
    .values({ dealershipId: actor.dealershipId, ...logo })
    .onConflictDoUpdate({
      target: dealershipBrandings.dealershipId,
      set: { ...logo, updatedAt: new Date() },
    });
  return getBranding({ db, actor });
}
