/**
 * A table cell read as a number: the value, or why it is not one. `zero` says whether 0 is
 * allowed (a period or a spectral value may be 0; a storey's height, mass and stiffness may not).
 */
export function numberCell(
  raw: string | undefined,
  zero: boolean,
): { value: number } | { problem: string } {
  const text = (raw ?? '').trim();
  if (text === '') return { problem: 'The cell is empty' };
  const value = Number(text.replace(/,/g, ''));
  if (!Number.isFinite(value)) return { problem: `"${text.slice(0, 40)}" is not a number` };
  if (zero ? value < 0 : value <= 0) {
    return { problem: `${text} must be ${zero ? '0 or more' : 'more than 0'}` };
  }
  return { value };
}

/** The spreadsheet row of each non-blank line, and the header row's index (-1 if none). */
export function nonBlankRows(cells: readonly (readonly string[])[]): number[] {
  return cells.flatMap((row, i) => (row.some((c) => c.trim() !== '') ? [i] : []));
}
