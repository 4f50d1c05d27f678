/** What a spreadsheet reads as the start of a formula: = + - @, and tab or carriage return before one. */
const formulaStart = /^[=+\-@\t\r]/;

/**
 * Neutralise formula — makes a text cell safe to open in a spreadsheet by putting an apostrophe
 * before a leading =, +, -, @, tab or carriage return.
 *
 * Purpose: notes are stored exactly as typed, even "=HYPERLINK(…)"; exports (CSV, workbook) pass
 * every text cell through this so that a spreadsheet shows the text instead of running it. Use
 * it on text only: numbers are exported as numbers ("-3" must stay a number).
 * Reference: OWASP, CSV Injection, https://owasp.org/www-community/attacks/CSV_Injection
 * Throws: nothing.
 * Example: `neutraliseFormula('=1+1')` → `"'=1+1"`
 */
export function neutraliseFormula(text: string): string {
  return formulaStart.test(text) ? `'${text}` : text;
}

/** True when a cell that is not a number would be read by a spreadsheet as a formula. */
export function looksLikeFormula(text: string): boolean {
  return /^[=+\-@]/.test(text.trim());
}
