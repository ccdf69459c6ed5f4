/**
 * A text cell that a spreadsheet would read as a formula (it begins with =, +, -, @, a tab or a
 * carriage return) gets a leading apostrophe, so it shows as text and never runs (OWASP, "CSV
 * Injection"). Numbers stay numbers: only text cells are touched.
 */
export function spreadsheetSafe(value: string | number | null): string | number | null {
  if (typeof value !== 'string') return value;
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}
