/**
 * Neutralise text that a spreadsheet would run as a formula when a CSV file is opened ("CSV
 * Injection", also called formula injection).
 *
 * Source: OWASP, "CSV Injection" (owasp.org/www-community/attacks/CSV_Injection): fields beginning
 * with `=`, `+`, `-`, `@`, tab (0x09) or carriage return (0x0D) may be interpreted as formulas; the
 * guidance is to prepend a single quote to such a field and to wrap every field in double quotes
 * (escaping embedded double quotes by doubling them, as RFC 4180 §2 rule 7 says).
 *
 * We also treat U+2212 MINUS SIGN and the full-width forms ＝ ＋ － ＠ (U+FF1D, U+FF0B, U+FF0D,
 * U+FF20) as triggers: some spreadsheet programs normalise them to their ASCII twins on input
 * (common practice in hardening guides; not in the OWASP list). Leading whitespace is looked through,
 * because some programs trim a field before deciding whether it is a formula.
 *
 * Numbers are not text: a number such as −3.2 is written as a number and stays one. Only strings pass
 * through this function.
 */
export const FORMULA_TRIGGERS: readonly string[] = ['=', '+', '-', '@', '\t', '\r', '\u2212', '\uFF1D', '\uFF0B', '\uFF0D', '\uFF20'];

/** True when a spreadsheet could read `text` as a formula (see {@link FORMULA_TRIGGERS}). */
export function isFormulaLike(text: string): boolean {
  if (text.length === 0) return false;
  if (FORMULA_TRIGGERS.includes(text[0] as string)) return true;
  const trimmed = text.replace(/^[ \u00A0\n]+/, '');
  return trimmed.length > 0 && trimmed !== text && FORMULA_TRIGGERS.includes(trimmed[0] as string);
}

/** Prefix a single quote to formula-like text (OWASP CSV Injection); other text is returned unchanged. */
export function neutralizeCsvText(text: string): string {
  return isFormulaLike(text) ? `'${text}` : text;
}
