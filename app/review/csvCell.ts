/**
 * A text cell a spreadsheet will not run: text that begins with =, +, - or @ (or a tab or
 * carriage return, which some programs skip before reading a formula) gets a leading
 * apostrophe, the usual neutralisation of CSV formula injection (OWASP, "CSV Injection").
 * Only text cells pass through here: numbers stay numbers, a negative number included.
 */
export function textCell(s: string): string {
  return /^[=+\-@\t\r]/.test(s) ? `'${s}` : s;
}
