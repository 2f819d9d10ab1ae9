// Runs in the worker process (scripts/worker.ts), so no "server-only" marker.
import { createReadStream } from "node:fs";
import { open } from "node:fs/promises";
import { Readable } from "node:stream";
import { and, eq } from "drizzle-orm";
import type { Db, DbOrTx } from "@/db/client";
import { dutyCycleImportErrors, dutyCycles, dutyCycleTurns, dutyCycleUploads } from "@/db/schema";
import type { TColumnMapping } from "@/lib/duty-cycles/column-mapping";
import { createTelematicsImporter, type TImportResult } from "@/lib/duty-cycles/telematics-import";
import { createScheduleImporter } from "@/lib/duty-cycles/schedule-import";
import { ImportFailure, type TRowError } from "@/lib/duty-cycles/row-errors";
import { CONTENT_PROBLEM_MESSAGES, sniffContent } from "@/lib/duty-cycles/sniff-content";
import { summariseDutyCycle } from "@/lib/duty-cycles/summarise";
import type { TStoredTurn } from "@/lib/duty-cycles/stored-duty-cycle";
import { readCsvRows } from "@/features/duty-cycles/server/read-csv-rows";
import { uploadPath } from "@/features/duty-cycles/server/upload-storage";
import { insertTurns } from "@/features/duty-cycles/server/insert-turns";
import { IMPORT_LIVENESS } from "@/features/duty-cycles/server/import-queue";

const PROGRESS_EVERY_MS = 500;
const INSERT_BATCH = 1000;

/** "superseded": this run was taken over (its worker was thought dead); it stored nothing. */
export type TRunImportOutcome = "ready" | "failed" | "skipped" | "superseded";

/** Replaces the turns, bad rows and totals of a cycle in one go (inside the caller's transaction). */
async function replaceContents(
  tx: DbOrTx,
  dutyCycleId: string,
  turns: readonly TStoredTurn[],
  errors: readonly TRowError[],
  errorCount: number,
) {
  await tx.delete(dutyCycleTurns).where(eq(dutyCycleTurns.dutyCycleId, dutyCycleId));
  await tx.delete(dutyCycleImportErrors).where(eq(dutyCycleImportErrors.dutyCycleId, dutyCycleId));
  await insertTurns(tx, dutyCycleId, turns);
  const rows = errors.map((e) => ({ dutyCycleId, ...e, truncated: false }));
  if (errorCount > errors.length)
    rows.push({
      dutyCycleId,
      line: 0,
      column: "(more)",
      reason: `${errorCount - errors.length} further rows were rejected and not listed`,
      value: null,
      truncated: true,
    });
  for (let i = 0; i < rows.length; i += INSERT_BATCH)
    await tx.insert(dutyCycleImportErrors).values(rows.slice(i, i + INSERT_BATCH));
}

/** Parses the stored file through the mapping; progress is reported as a share of bytes read. */
async function parseUpload(
  file: string,
  size: number,
  mapping: TColumnMapping,
  onProgress: (share: number) => void,
): Promise<TImportResult> {
  const handle = await open(file, "r");
  try {
    const head = new Uint8Array(4096);
    const { bytesRead } = await handle.read(head, 0, head.length, 0);
    const problem = sniffContent(head.subarray(0, bytesRead));
    if (problem) throw new ImportFailure(CONTENT_PROBLEM_MESSAGES[problem]);
  } finally {
    await handle.close();
  }
  const importer =
    mapping.kind === "telematics"
      ? createTelematicsImporter(mapping)
      : createScheduleImporter(mapping);
  const raw = createReadStream(file, { highWaterMark: 256 * 1024 });
  const input = decodeText(raw, mapping.encoding);
  let read = 0;
  let last = 0;
  input.on("data", (chunk) => {
    read += chunk.length;
    const now = Date.now();
    if (now - last >= PROGRESS_EVERY_MS) {
      last = now;
      onProgress(Math.min(0.95, read / Math.max(size, 1)));
    }
  });
  await readCsvRows({
    input,
    delimiter: mapping.delimiter,
    hasHeader: mapping.hasHeader,
    onRecord: importer.pushRow,
  });
  return importer.finish();
}

/**
 * Processes one uploaded duty cycle. Everything it stores is written in one transaction at the
 * end, after deleting what an earlier, interrupted attempt might have left, so running it twice
 * (a retry, or a restart after a crash) gives the same rows, never duplicates. Each run owns the
 * cycle through its attempt number and renews a heartbeat while it works; a run whose cycle was
 * handed to another attempt (see recoverStalledImports) stores nothing.
 */
export async function runImport({
  db,
  dutyCycleId,
  onTimings,
}: {
  db: Db;
  dutyCycleId: string;
  /** Reports how long reading the file and storing the result took (ms). */
  onTimings?: (t: { parseMs: number; storeMs: number }) => void;
}): Promise<TRunImportOutcome> {
  const [cycle] = await db.select().from(dutyCycles).where(eq(dutyCycles.id, dutyCycleId));
  if (!cycle || cycle.source === "builder" || !cycle.uploadId || !cycle.mapping) return "skipped";
  if (cycle.status === "ready") return "skipped";
  const [upload] = await db
    .select()
    .from(dutyCycleUploads)
    .where(eq(dutyCycleUploads.id, cycle.uploadId));
  const attempt = cycle.attempts + 1;
  const ours = and(eq(dutyCycles.id, dutyCycleId), eq(dutyCycles.attempts, attempt));
  await db
    .update(dutyCycles)
    .set({
      status: "processing",
      progress: 0,
      failureReason: null,
      attempts: attempt,
      processingStartedAt: new Date(),
      heartbeatAt: new Date(),
      updatedAt: new Date(),
    })
    .where(eq(dutyCycles.id, dutyCycleId));
  const heartbeat = setInterval(() => {
    db.update(dutyCycles)
      .set({ heartbeatAt: new Date() })
      .where(and(ours, eq(dutyCycles.status, "processing")))
      .catch(() => undefined); // a missed beat only risks an early, harmless takeover
  }, IMPORT_LIVENESS.heartbeatSeconds * 1000);
  /** Locks the cycle; true while it is still this attempt's to finish. */
  const stillOurs = async (tx: DbOrTx) => {
    const [row] = await tx
      .select({ status: dutyCycles.status, attempts: dutyCycles.attempts })
      .from(dutyCycles)
      .where(eq(dutyCycles.id, dutyCycleId))
      .for("update");
    return row?.status === "processing" && row.attempts === attempt;
  };

  let progressWrite: Promise<unknown> = Promise.resolve();
  const onProgress = (share: number) => {
    progressWrite = progressWrite
      .then(() =>
        db.update(dutyCycles).set({ progress: share }).where(eq(dutyCycles.id, dutyCycleId)),
      )
      .catch(() => undefined); // progress is cosmetic: never fail an import over it
  };

  try {
    if (!upload) throw new ImportFailure("The uploaded file is no longer stored. Upload it again.");
    const mapping = cycle.mapping as TColumnMapping;
    const parseStarted = performance.now();
    const result = await parseUpload(
      uploadPath(upload.storagePath),
      upload.sizeBytes,
      mapping,
      onProgress,
    );
    await progressWrite;
    const storeStarted = performance.now();
    const summary = summariseDutyCycle({
      turns: result.turns,
      straight: result.straight,
      operatingHours: result.operatingHours,
      speedHistogram: result.speedHistogram,
      rowsUsed: result.rowsUsed,
      rowsSkipped: result.rowsSkipped,
    });
    const stored = await db.transaction(async (tx) => {
      if (!(await stillOurs(tx))) return false;
      await replaceContents(tx, dutyCycleId, result.turns, result.errors, result.errorCount);
      await tx
        .update(dutyCycles)
        .set({
          status: "ready",
          progress: 1,
          failureReason: null,
          operatingHours: result.operatingHours,
          summary,
          straight: result.straight,
          rowsUsed: result.rowsUsed,
          rowsSkipped: result.rowsSkipped,
          heartbeatAt: null,
          processedAt: new Date(),
          updatedAt: new Date(),
        })
        .where(eq(dutyCycles.id, dutyCycleId));
      return true;
    });
    if (!stored) return "superseded";
    onTimings?.({
      parseMs: storeStarted - parseStarted,
      storeMs: performance.now() - storeStarted,
    });
    return "ready";
  } catch (e) {
    await progressWrite;
    const failure = e instanceof ImportFailure ? e : undefined;
    const reason = failure
      ? failure.message
      : `Processing stopped: ${e instanceof Error ? e.message : String(e)}. Retry; if it fails again, check the file.`;
    const stored = await db.transaction(async (tx) => {
      if (!(await stillOurs(tx))) return false;
      await replaceContents(tx, dutyCycleId, [], failure?.errors ?? [], failure?.errorCount ?? 0);
      await tx
        .update(dutyCycles)
        .set({
          status: "failed",
          failureReason: reason,
          progress: 0,
          summary: null,
          rowsUsed: 0,
          rowsSkipped: failure?.errorCount ?? 0,
          heartbeatAt: null,
          processedAt: new Date(),
          updatedAt: new Date(),
        })
        .where(eq(dutyCycles.id, dutyCycleId));
      return true;
    });
    if (!stored) return "superseded";
    // A bad file will not get better on its own; anything else is worth the queue's retry.
    if (!failure) throw e;
    return "failed";
  } finally {
    clearInterval(heartbeat);
  }
}

/**
 * Bytes to text as the browser preview read them: "latin1" is Windows-1252 (the WHATWG
 * Encoding Standard's meaning of the label, a superset of ISO-8859-1 with € and curly quotes).
 */
function decodeText(raw: Readable, encoding: "utf-8" | "latin1"): Readable {
  const decoder = new TextDecoder(encoding === "latin1" ? "windows-1252" : "utf-8");
  const decoded = Readable.from(
    (async function* () {
      for await (const chunk of raw) {
        const text = decoder.decode(chunk as Buffer, { stream: true });
        if (text) yield text;
      }
      const rest = decoder.decode();
      if (rest) yield rest;
    })(),
  );
  // Byte counts for the progress bar come from the raw stream.
  decoded.on("close", () => raw.destroy());
  return decoded;
}
