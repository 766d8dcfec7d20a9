/**
 * Spreadsheet-safe text for CSV downloads. A spreadsheet that opens a CSV reads a cell starting with `=`, `+`,
 * `-` or `@` as a formula (and a leading tab or carriage return can hide such a start), so a title or note such
 * as `=HYPERLINK("http://…")` would run when a reader opens the download. Such a text cell gets a leading
 * apostrophe, which spreadsheets show as text and which a reader sees as plainly added. Plain decimal numbers
 * (`-1.5e-3`) are left alone: a spreadsheet reads them as numbers, which is what they are.
 * Reference: OWASP, "CSV Injection" (https://owasp.org/www-community/attacks/CSV_Injection), common practice.
 *
 * The check looks past leading spaces and an opening double quote, since a spreadsheet reading an unquoted line
 * may strip them before deciding.
 *
 * @param cell one cell's text, as it will stand between the commas
 * @returns the same text, or with `'` inserted before the character that would start a formula
 * @example spreadsheetSafeText('=1+1') // => "'=1+1"
 * @example spreadsheetSafeText(' "@SUM(A1)"') // => ' "\'@SUM(A1)"'
 * @example spreadsheetSafeText('-1.25e-3') // => "-1.25e-3"
 */
export function spreadsheetSafeText(cell: string): string {
  if (/^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/.test(cell)) return cell;
  return cell.replace(/^([ ]*"?[ ]*)([=+\-@\t\r])/, "$1'$2");
}
