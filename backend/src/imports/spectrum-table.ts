import {
  ANALYSIS_LIMITS,
  type DecimalMark,
  type ImportCellError,
  type ImportReadAs,
  type SpectrumPointInput,
} from '@tiermode/shared-types';
import { cellCountProblem, numberCell, nonBlankRows, readAsFor } from './cells';
import type { TableCells } from './read-table';

const PERIOD = 'Period (s)';
const SA = 'Sa (g)';

/**
 * Reads a design spectrum table: a header row naming "Period" and "Sa" (units s and g, which
 * are the only ones taken), then one point per row with periods increasing. Problems are named by
 * spreadsheet row (the header is row 1) and column.
 */
export function parseSpectrumTable(
  { cells, delimiter }: TableCells,
  decimal?: DecimalMark,
): {
  points: SpectrumPointInput[];
  errors: ImportCellError[];
  readAs: ImportReadAs;
} {
  const rows = nonBlankRows(cells);
  let readAs: ImportReadAs = { delimiter, decimal: decimal ?? null };
  if (rows.length === 0) {
    return {
      points: [],
      errors: [{ row: 1, column: 'file', message: 'The file has no rows' }],
      readAs,
    };
  }
  const header = cells[rows[0]].map((h) => h.trim().toLowerCase());
  const find = (name: string) =>
    header.findIndex((h) => h === name || h.startsWith(`${name} `) || h.startsWith(`${name}(`));
  const periodAt = find('period');
  const saAt = find('sa');
  const errors: ImportCellError[] = [];
  for (const [at, column] of [
    [periodAt, PERIOD],
    [saAt, SA],
  ] as const) {
    if (at < 0) {
      errors.push({ row: rows[0] + 1, column, message: `The column "${column}" is missing` });
    } else if (!/^[a-z]+\s*(\((s|g)\))?$/.test(header[at])) {
      errors.push({
        row: rows[0] + 1,
        column,
        message: `The column "${cells[rows[0]][at].trim()}" must be in ${column === PERIOD ? 's' : 'g'}`,
      });
    }
  }
  if (errors.length > 0) return { points: [], errors, readAs };
  readAs = readAsFor(
    rows.slice(1).flatMap((r) => [cells[r][periodAt] ?? '', cells[r][saAt] ?? '']),
    delimiter,
    decimal,
  );
  const points: SpectrumPointInput[] = [];
  for (const r of rows.slice(1)) {
    const miscounted = cellCountProblem(cells[r], cells[rows[0]], delimiter);
    if (miscounted) {
      errors.push({ row: r + 1, column: 'row', message: miscounted });
      continue;
    }
    const period = numberCell(cells[r][periodAt], true, readAs.decimal);
    const sa = numberCell(cells[r][saAt], true, readAs.decimal);
    if ('problem' in period) errors.push({ row: r + 1, column: PERIOD, message: period.problem });
    if ('problem' in sa) errors.push({ row: r + 1, column: SA, message: sa.problem });
    if ('value' in period && 'value' in sa) {
      const last = points[points.length - 1];
      if (last && period.value <= last.period) {
        errors.push({
          row: r + 1,
          column: PERIOD,
          message: `${period.value} s must be more than the period above it (${last.period} s)`,
        });
      } else {
        points.push({ period: period.value, sa: sa.value });
      }
    }
  }
  if (errors.length === 0 && points.length < ANALYSIS_LIMITS.minSpectrumPoints) {
    errors.push({
      row: rows[0] + 2,
      column: 'file',
      message: 'A spectrum needs at least two points',
    });
  }
  if (points.length > ANALYSIS_LIMITS.maxSpectrumPoints) {
    errors.push({
      row: rows[0] + 2 + ANALYSIS_LIMITS.maxSpectrumPoints,
      column: 'file',
      message: `At most ${ANALYSIS_LIMITS.maxSpectrumPoints} points`,
    });
  }
  return { points, errors, readAs };
}
