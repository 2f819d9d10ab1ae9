import "server-only";
import { createHash, randomUUID } from "node:crypto";
import { createWriteStream } from "node:fs";
import { mkdir, rm } from "node:fs/promises";
import path from "node:path";
import { Readable, Transform } from "node:stream";
import { pipeline } from "node:stream/promises";
import type { ReadableStream as WebReadableStream } from "node:stream/web";
import type { DbOrTx } from "@/db/client";
import { dutyCycleUploads } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { CONTENT_PROBLEM_MESSAGES, sniffContent } from "@/lib/duty-cycles/sniff-content";
import { DutyCycleError } from "@/features/duty-cycles/server/errors";
import { requireDutyCycleWrite } from "@/features/duty-cycles/server/authorize";
import { uploadPath } from "@/features/duty-cycles/server/upload-storage";

export type TUploadDto = {
  id: string;
  originalName: string;
  sizeBytes: number;
  sha256: string;
  uploadedAt: string;
};

function tooLarge(limit: number) {
  const mb = (limit / (1024 * 1024)).toFixed(limit % (1024 * 1024) === 0 ? 0 : 1);
  return new DutyCycleError(
    413,
    "too_large",
    `The file is larger than the upload limit of ${mb} MB (${limit} bytes). Split the log into shorter periods, or ask your administrator to raise UPLOAD_LIMIT_BYTES.`,
  );
}

/** A display name without folders or control characters. */
function cleanName(raw: string | null): string {
  let name = "upload.csv";
  try {
    name = raw ? decodeURIComponent(raw) : name;
  } catch {
    name = raw ?? name;
  }
  return (
    path
      .basename(name)
      .replace(/[\u0000-\u001f]/g, "")
      .slice(0, 200) || "upload.csv"
  );
}

/**
 * Streams a request body to the upload folder, hashing it on the way, and records it. The body
 * is never held in memory; over the limit the partial file is removed and the answer is 413.
 */
export async function createUpload({
  db,
  actor,
  body,
  fileName,
  contentLength,
  limit,
}: {
  db: DbOrTx;
  actor: TActor;
  body: ReadableStream<Uint8Array> | null;
  fileName: string | null;
  contentLength: number | null;
  limit: number;
}): Promise<TUploadDto> {
  requireDutyCycleWrite(actor);
  if (contentLength !== null && contentLength > limit) throw tooLarge(limit);
  if (!body) throw new DutyCycleError(400, "empty", CONTENT_PROBLEM_MESSAGES.empty);
  const id = randomUUID();
  const storagePath = path.join(actor.dealershipId, `${id}.csv`);
  const file = uploadPath(storagePath);
  await mkdir(path.dirname(file), { recursive: true });

  const hash = createHash("sha256");
  let size = 0;
  const head: Buffer[] = [];
  let headBytes = 0;
  const meter = new Transform({
    transform(chunk: Buffer, _enc, done) {
      size += chunk.length;
      if (size > limit) return done(tooLarge(limit));
      if (headBytes < 4096) {
        head.push(chunk);
        headBytes += chunk.length;
      }
      hash.update(chunk);
      done(null, chunk);
    },
  });
  try {
    await pipeline(
      Readable.fromWeb(body as unknown as WebReadableStream<Uint8Array>),
      meter,
      createWriteStream(file, { flags: "wx" }),
    );
    const problem = sniffContent(new Uint8Array(Buffer.concat(head).subarray(0, 4096)));
    if (problem)
      throw new DutyCycleError(400, `content_${problem}`, CONTENT_PROBLEM_MESSAGES[problem]);
    const [row] = await db
      .insert(dutyCycleUploads)
      .values({
        id,
        dealershipId: actor.dealershipId,
        originalName: cleanName(fileName),
        storagePath,
        sha256: hash.digest("hex"),
        sizeBytes: size,
        contentType: "text/csv",
        uploadedById: actor.userId,
      })
      .returning();
    return {
      id: row!.id,
      originalName: row!.originalName,
      sizeBytes: row!.sizeBytes,
      sha256: row!.sha256,
      uploadedAt: row!.uploadedAt.toISOString(),
    };
  } catch (e) {
    await rm(file, { force: true });
    throw e;
  }
}
