import {
  detectDecimalMark,
  numberUnder,
  type DecimalMark,
  type Delimiter,
  type ImportReadAs,
} from '@tiermode/shared-types';

/**
 * A table cell read as a number: the value, or why it is not one. `decimal` is the file's decimal
 * mark (null: not settled by any cell, so a cell such as "1,020" that reads two ways is refused as
 * ambiguous). `zero` says whether 0 is allowed (a period or a spectral value may be 0; a storey's
 * height, mass and stiffness may not).
 */
export function numberCell(
  raw: string | undefined,
  zero: boolean,
  decimal: DecimalMark | null,
): { value: number } | { problem: string } {
  const text = (raw ?? '').trim();
  const read = numberUnder(text, decimal);
  if ('problem' in read) {
    return { problem: read.problem.charAt(0).toUpperCase() + read.problem.slice(1) };
  }
  const { value } = read;
  if (zero ? value < 0 : value <= 0) {
    return { problem: `${text} must be ${zero ? '0 or more' : 'more than 0'}` };
  }
  return { value };
}

/** The spreadsheet row of each non-blank line, and the header row's index (-1 if none). */
export function nonBlankRows(cells: readonly (readonly string[])[]): number[] {
  return cells.flatMap((row, i) => (row.some((c) => c.trim() !== '') ? [i] : []));
}

/**
 * How a file's numbers are read: the decimal mark asked for, or the one its number cells settle
 * (detectDecimalMark), and the delimiter its CSV text was read with (null for a workbook).
 */
export function readAsFor(
  numberCells: Iterable<string>,
  delimiter: Delimiter | null,
  asked: DecimalMark | undefined,
): ImportReadAs {
  return { delimiter, decimal: asked ?? detectDecimalMark(numberCells) };
}

/**
 * A CSV row whose cell count differs from the header's (trailing empty cells aside): a comma in a
 * number split it, or a separator is missing. Null where the counts agree or the table came
 * from a workbook (whose cells are never split).
 */
export function cellCountProblem(
  row: readonly string[],
  header: readonly string[],
  delimiter: Delimiter | null,
): string | null {
  if (delimiter === null) return null;
  const width = (cells: readonly string[]) => {
    let n = cells.length;
    while (n > 0 && cells[n - 1].trim() === '') n -= 1;
    return n;
  };
  const [cells, headers] = [width(row), width(header)];
  if (cells === headers) return null;
  return `${cells} cells where the header has ${headers}${
    cells > headers && delimiter === 'comma'
      ? ': a comma inside a number (a thousands separator or a decimal comma)? Separate the columns with semicolons'
      : ': check the separators in this row'
  }`;
}
