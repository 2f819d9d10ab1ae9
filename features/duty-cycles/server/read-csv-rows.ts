// Used by the worker process as well as the app, so no "server-only" marker (it throws outside Next).
import Papa from "papaparse";
import type { Readable } from "node:stream";

/**
 * Streams CSV records out of a readable of text with papaparse, never holding the file:
 * records reach `onRecord` with their line number (1-based, counting the header). Empty lines
 * are skipped but still counted, so line numbers match what a text editor shows.
 */
export function readCsvRows({
  input,
  delimiter,
  hasHeader,
  onRecord,
}: {
  input: Readable;
  delimiter: string;
  hasHeader: boolean;
  onRecord: (fields: string[], line: number) => void;
}): Promise<{ records: number; lines: number }> {
  return new Promise((resolve, reject) => {
    let line = 0;
    let records = 0;
    let headerSeen = !hasHeader;
    let failed = false;
    Papa.parse<string[]>(input as unknown as File, {
      delimiter,
      header: false,
      skipEmptyLines: false,
      chunk(results, parser) {
        try {
          for (const row of results.data) {
            line++;
            if (line === 1 && row.length > 0 && row[0]!.charCodeAt(0) === 0xfeff)
              row[0] = row[0]!.slice(1);
            if (row.length === 1 && row[0]!.trim() === "") continue;
            if (!headerSeen) {
              headerSeen = true;
              continue;
            }
            records++;
            onRecord(row, line);
          }
        } catch (e) {
          failed = true;
          parser.abort();
          reject(e);
        }
      },
      complete() {
        if (!failed) resolve({ records, lines: line });
      },
      error(e: Error) {
        failed = true;
        reject(e);
      },
    });
  });
}
