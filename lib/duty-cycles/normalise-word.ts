/**
 * Lower case without accents, so one pattern covers "Länge", "LÄNGE" and "Laenge": German
 * umlauts become their usual two-letter spelling, Polish ł becomes l, other accents drop.
 */
export function normaliseWord(text: string): string {
  return text
    .trim()
    .toLowerCase()
    .replace(/ä/g, "ae")
    .replace(/ö/g, "oe")
    .replace(/ü/g, "ue")
    .replace(/ß/g, "ss")
    .replace(/ł/g, "l")
    .normalize("NFD")
    .replace(/[\u0300-\u036f]/g, "");
}
