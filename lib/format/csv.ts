/**
 * CSV writing per RFC 4180 (quotes doubled, fields with comma, quote or line break quoted, CRLF
 * line ends), with spreadsheet formula injection neutralised: a text cell starting with = + - @,
 * tab or carriage return gets a leading apostrophe so a spreadsheet shows it as text
 * (OWASP "CSV Injection" guidance). Numbers are written as numbers.
 */
export type TCsvCell = string | number | boolean | null | undefined;

const FORMULA_START = /^[=+\-@\t\r]/;

export function csvCell(value: TCsvCell): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "number") return Number.isFinite(value) ? String(value) : "";
  let text = typeof value === "boolean" ? (value ? "yes" : "no") : value;
  if (FORMULA_START.test(text)) text = `'${text}`;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function toCsv(header: string[], rows: TCsvCell[][]): string {
  return [header, ...rows].map((r) => r.map(csvCell).join(",")).join("\r\n") + "\r\n";
}
