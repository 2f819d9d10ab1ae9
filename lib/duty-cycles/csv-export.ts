/** CSV the product writes, safe to open in a spreadsheet. */

/**
 * Spreadsheets run a cell that starts with = + - @ (or a tab or carriage return) as a formula.
 * A leading apostrophe makes it text (OWASP, "CSV Injection").
 */
export function neutraliseFormula(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

/** Quotes a field when it holds the delimiter, a quote or a line break (RFC 4180). */
export function csvField(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return "";
  const text = typeof value === "number" ? String(value) : neutraliseFormula(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function csvLine(values: readonly (string | number | null | undefined)[]): string {
  return values.map(csvField).join(",") + "\r\n";
}
