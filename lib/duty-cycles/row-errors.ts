/** Row-by-row validation results shared by the telematics and schedule imports. */
import type { TColumnRef } from "@/lib/duty-cycles/column-mapping";

export type TRowError = {
  /** Line of the file, counting the header row as line 1 when there is one. */
  line: number;
  column: string;
  reason: string;
  value: string | null;
};

/** An import that cannot produce a duty cycle: the message says what to fix. */
export class ImportFailure extends Error {
  constructor(
    message: string,
    readonly errors: TRowError[] = [],
    readonly errorCount = errors.length,
  ) {
    super(message);
    this.name = "ImportFailure";
  }
}

/** Collects row errors, keeping the first `limit` and counting the rest. */
export class RowErrorLog {
  readonly errors: TRowError[] = [];
  count = 0;
  constructor(private readonly limit: number) {}

  add(line: number, column: string, reason: string, value: string | null | undefined) {
    this.count++;
    if (this.errors.length < this.limit)
      this.errors.push({ line, column, reason, value: value ?? null });
  }
}

/** How a column is named in messages: its header, else its position. */
export function columnName(ref: TColumnRef): string {
  return ref.header?.trim() ? ref.header.trim() : `column ${ref.index + 1}`;
}

export function tooFewRowsFailure(used: number, skipped: number, log: RowErrorLog): ImportFailure {
  if (used === 0)
    return new ImportFailure(
      skipped === 0
        ? "The file has no data rows. Check that it is the right file and that the header setting is right."
        : `The file has no usable rows: all ${skipped} rows were rejected. Download the bad rows to see why; usually a column is mapped wrongly or its unit is wrong.`,
      log.errors,
      log.count,
    );
  return new ImportFailure(
    `${skipped} of ${used + skipped} rows were rejected, more than half. Check the column mapping and units, then upload again. Download the bad rows to see why.`,
    log.errors,
    log.count,
  );
}
