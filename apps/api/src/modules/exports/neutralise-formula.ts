/**
 * Spreadsheet formula injection guard (OWASP "CSV Injection"): text that a spreadsheet would
 * read as a formula — starting with = + - @, or a tab / carriage return that some programs
 * strip before parsing — gets a leading apostrophe so it stays text. Numbers are left alone:
 * a negative forcing is a number, not text.
 * Example: neutraliseFormula("=HYPERLINK(…)") === "'=HYPERLINK(…)".
 */
export function neutraliseFormula(text: string): string {
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}
