/** Unicode superscripts of the characters an exponent is written with (· for a decimal point). */
const SUPERSCRIPT: Readonly<Record<string, string>> = {
  '-': '⁻',
  '.': '·',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};

/** `text` with the characters `which` matches (by default sign, point and digits) set as superscripts. */
export function superscript(text: string, which: RegExp = /[-.0-9]/g): string {
  return text.replace(which, (c) => SUPERSCRIPT[c] ?? c);
}
