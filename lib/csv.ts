import { unparse } from "papaparse";

// CSV files a grower opens in a spreadsheet. A text cell that starts with = + - @
// tab or CR would run as a formula there (CSV injection, OWASP), so every CSV
// Castline writes goes through spreadsheetCsv, which prefixes such cells with an
// apostrophe. This is the one place that decides what "formula-looking" means.

/**
 * papaparse's own `escapeFormulae: true` pattern is /^[=+\-@\t\r].*$/ — without
 * the s flag `.*$` stops at a newline, so a multi-line note starting with "="
 * slipped through unescaped. Only the first character matters.
 */
export const FORMULA_START = /^[=+\-@\t\r]/;

export type CsvCell = string | number | null;

/** Rows → CSV text with formula-looking text cells neutralised (numbers are left as numbers). */
export function spreadsheetCsv(rows: CsvCell[][]): string {
  return unparse(rows, { escapeFormulae: FORMULA_START });
}

/**
 * A cell read back from a CSV: our own neutralised form ("'=…") gives its text
 * back; `looksLikeFormula` tells a reader to refuse a cell that still starts
 * like a formula (someone typed it, or another program wrote it).
 */
export function readCsvCell(raw: string | undefined): { text: string; looksLikeFormula: boolean } {
  const cell = raw ?? "";
  if (cell.startsWith("'") && FORMULA_START.test(cell.slice(1)))
    return { text: cell.slice(1).trim(), looksLikeFormula: false };
  return { text: cell.trim(), looksLikeFormula: FORMULA_START.test(cell.trimStart()) };
}
