/**
 * Protection of text cells against formula injection ("CSV injection"):
 * a spreadsheet treats a cell that starts with `=`, `+`, `-` or `@` as a
 * formula, and tab, CR, LF and NUL at the start can hide such a start from a
 * reviewer. Such cells are prefixed with a single quote so spreadsheets show
 * them as text [S: OWASP CSV Injection page, "Ensure that no cells begin
 * with any of the following characters"; OWASP ASVS 5.0.0 requirement
 * 1.2.10; SECURITY.md "Input, uploads, exports"].
 *
 * Only text cells pass through here. Numbers are written as numbers by the
 * CSV writer, so a negative power stays the number -250, not the text '-250.
 */

const FORMULA_STARTS = new Set(['=', '+', '-', '@', '\t', '\r', '\n', '\0']);

// C0 controls other than tab, LF and CR are not text: our own upload parser
// refuses a file holding them and many tools cut a field at NUL, so they are
// removed after the prefix decision (which still sees a leading NUL).
const NON_TEXT_CONTROLS = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/g;

/** The text to write for a user-controlled text cell. */
export function guardTextCell(text: string): string {
  const risky = text.length > 0 && FORMULA_STARTS.has(text.charAt(0));
  const prefixed = risky ? `'${text}` : text;
  return prefixed.replace(NON_TEXT_CONTROLS, '');
}
