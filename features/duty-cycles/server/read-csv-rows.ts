// Used by the worker process as well as the app, so no "server-only" marker (it throws outside Next).
import Papa from "papaparse";
import { Readable } from "node:stream";

/**
 * Reads ahead until the line ending is known. Papaparse guesses it from its first chunk, which
 * goes wrong when a chunk ends between the \r and \n of a CRLF file.
 */
async function withLineEnding(input: Readable): Promise<{ stream: Readable; newline: string }> {
  const iterator = input[Symbol.asyncIterator]() as AsyncIterator<string | Buffer>;
  const seen: string[] = [];
  let text = "";
  for (;;) {
    const next = await iterator.next();
    if (next.done) break;
    const piece = typeof next.value === "string" ? next.value : next.value.toString("utf8");
    seen.push(piece);
    text += piece;
    const i = text.search(/[\r\n]/);
    if (i >= 0 && (text[i] === "\n" || i + 1 < text.length)) break;
    if (text.length > 1 << 20) break; // no line ending in the first megabyte: one long line
  }
  const i = text.search(/[\r\n]/);
  const newline = i < 0 || text[i] === "\n" ? "\n" : text[i + 1] === "\n" ? "\r\n" : "\r";
  async function* rest() {
    yield* seen;
    for (;;) {
      const next = await iterator.next();
      if (next.done) return;
      yield next.value;
    }
  }
  return { stream: Readable.from(rest()), newline };
}

/**
 * Streams CSV records out of a readable of text with papaparse, never holding the file:
 * records reach `onRecord` with their line number (1-based, counting the header). Empty lines
 * are skipped but still counted, so line numbers match what a text editor shows.
 */
export async function readCsvRows({
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
  const { stream, newline } = await withLineEnding(input);
  return new Promise((resolve, reject) => {
    let line = 0;
    let records = 0;
    let headerSeen = !hasHeader;
    let failed = false;
    Papa.parse<string[]>(stream as unknown as File, {
      delimiter,
      newline: newline as "\n",
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
