import Papa from "papaparse";

export type TPreview = { delimiter: string; rows: string[][]; truncated: boolean };

/** Reads the first rows of a file in the browser with papaparse; delimiter "" means detect it. */
export function readPreview(
  file: File,
  opts: { delimiter: string; encoding: "utf-8" | "latin1" },
): Promise<TPreview> {
  return new Promise((resolve, reject) => {
    Papa.parse<string[]>(file, {
      preview: 25,
      delimiter: opts.delimiter,
      encoding: opts.encoding === "latin1" ? "ISO-8859-1" : "UTF-8",
      skipEmptyLines: "greedy",
      complete: (results) =>
        resolve({
          delimiter: results.meta.delimiter,
          rows: results.data.map((r) => r.map((c, i) => (i === 0 ? c.replace(/^\ufeff/, "") : c))),
          truncated: results.meta.truncated,
        }),
      error: (e) => reject(e),
    });
  });
}
