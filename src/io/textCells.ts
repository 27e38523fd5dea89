/**
 * Text cells from user input — window labels, option names — made safe to write into a CSV file or
 * a sheet: a spreadsheet program reads a cell that starts with `=`, `+`, `-` or `@` (and, after a
 * tab or a carriage return, some programs do too) as a formula, so a label such as
 * `=HYPERLINK(...)` would run when the file is opened. Such a text gets an apostrophe in front,
 * as the OWASP "CSV Injection" guidance recommends; in a sheet written through Excel's API the
 * apostrophe is Excel's own "this is text" mark and is not shown. The full-width forms of the four
 * characters are included: some input methods type them and some spreadsheet programs read them
 * as the ASCII ones.
 *
 * Only text that came from the user goes through here; numbers (negative ones included) and our
 * own headers are written as they are.
 */

const FORMULA_START = /^[=+\-@\t\r\uFF1D\uFF0B\uFF0D\uFF20]/;

/**
 * A user's text as a cell value that is never read as a formula.
 * @param text - any text
 * @returns `text`, with an apostrophe in front when it starts with = + - @ (ASCII or full-width), a tab or a carriage return
 */
export function escapeFormulaText(text: string): string {
  return FORMULA_START.test(text) ? `'${text}` : text;
}
