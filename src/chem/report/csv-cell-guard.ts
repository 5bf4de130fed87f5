/**
 * The one guard for text cells a program writes to CSV (the sheet's download, the command line's
 * `screen` output): text a spreadsheet would run as a formula when the file is opened gets a leading
 * single quote, so it is shown as text ("CSV Injection", also called formula injection).
 *
 * Guidance: OWASP, "CSV Injection" (owasp.org/www-community/attacks/CSV_Injection): fields beginning
 * with `=`, `+`, `-`, `@`, tab (0x09) or carriage return (0x0D) may be read as formulas; prepend a
 * single quote to such a field, and wrap every field in double quotes (doubling embedded quotes,
 * RFC 4180 §2 rule 7 — the writers do that part).
 *
 * Our hardening beyond the OWASP list (common practice in hardening guides, since some spreadsheet
 * programs fold look-alikes to their ASCII twins on input):
 * - U+2212 MINUS SIGN;
 * - the full-width forms ＝ ＋ － ＠ (U+FF1D, U+FF0B, U+FF0D, U+FF20);
 * - the small forms ﹦ ﹢ ﹣ ﹫ (U+FE66, U+FE62, U+FE63, U+FE6B);
 * - a trigger behind leading white space (space, no-break space, line feed, …) or behind invisible
 *   format characters (Unicode category Cf: zero-width space and joiners U+200B–U+200D, the
 *   direction marks U+200E–U+200F and U+202A–U+202E, word joiner U+2060, byte-order mark U+FEFF, …),
 *   because a program may trim or drop them before it decides whether a field is a formula.
 *
 * Numbers are not text: a number such as −3.2 is written as a number and stays one. Only strings pass
 * through {@link neutralizeCsvText}; {@link safeCsvCell} leaves other values unchanged.
 */
export const CSV_FORMULA_TRIGGERS: readonly string[] = [
  '=',
  '+',
  '-',
  '@',
  '\t',
  '\r',
  '\u2212',
  '\uFF1D',
  '\uFF0B',
  '\uFF0D',
  '\uFF20',
  '\uFE66',
  '\uFE62',
  '\uFE63',
  '\uFE6B',
];

const TRIGGERS: ReadonlySet<string> = new Set(CSV_FORMULA_TRIGGERS);

/**
 * Leading characters a spreadsheet may drop before reading a field: white space (but not tab or
 * carriage return, which are triggers themselves) and format characters (Cf).
 */
const LOOK_THROUGH = /^(?:[^\S\t\r]|\p{Cf})+/u;

/** True when a spreadsheet could read `text` as a formula (see {@link CSV_FORMULA_TRIGGERS}). */
export function isFormulaLike(text: string): boolean {
  if (text.length === 0) return false;
  if (TRIGGERS.has(text[0]!)) return true;
  const rest = text.replace(LOOK_THROUGH, '');
  return rest.length > 0 && rest !== text && TRIGGERS.has(rest[0]!);
}

/** Prefix a single quote to formula-like text (OWASP, "CSV Injection"); other text is unchanged. */
export function neutralizeCsvText(text: string): string {
  return isFormulaLike(text) ? `'${text}` : text;
}

/** A CSV cell value with formula-like text neutralised; numbers, null and other values unchanged. */
export function safeCsvCell<T>(value: T): T | string {
  return typeof value === 'string' ? neutralizeCsvText(value) : value;
}
