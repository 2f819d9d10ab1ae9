/** Tells from the first bytes of an upload whether it can be a CSV at all. */

export type TContentProblem = "empty" | "binary" | "html";

export const CONTENT_PROBLEM_MESSAGES: Record<TContentProblem, string> = {
  empty: "The file is empty. Export the log or schedule again and upload the CSV file.",
  binary:
    "The file is not text (it looks like a spreadsheet, archive or image). Save it as CSV and upload that.",
  html: "The file is a web page, not a CSV. Download the CSV itself rather than the page that links to it.",
};

/** Looks at up to the first few kilobytes of a file. */
export function sniffContent(head: Uint8Array): TContentProblem | undefined {
  let start = 0;
  // A UTF-8 byte order mark is fine.
  if (head[0] === 0xef && head[1] === 0xbb && head[2] === 0xbf) start = 3;
  let printable = 0;
  let seen = 0;
  for (let i = start; i < head.length; i++) {
    const b = head[i]!;
    if (b === 0) return "binary";
    seen++;
    if (b === 9 || b === 10 || b === 13 || b >= 32) printable++;
  }
  if (seen === 0) return "empty";
  if (printable / seen < 0.95) return "binary";
  const text = new TextDecoder("latin1").decode(head.subarray(start, start + 512)).trimStart();
  if (text.length === 0) return "empty";
  if (/^<(!doctype\s+html|html|head|body)\b/i.test(text)) return "html";
  return undefined;
}
