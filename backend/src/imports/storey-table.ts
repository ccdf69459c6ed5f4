import type {
  DecimalMark,
  DisplayUnits,
  ImportCellError,
  ImportedStorey,
  ImportReadAs,
} from '@tiermode/shared-types';
import { ANALYSIS_LIMITS } from '@tiermode/shared-types';
import { cellCountProblem, numberCell, readAsFor } from './cells';
import type { TableCells } from './read-table';

/**
 * Exact conversion factors to SI (NIST SP 811, appendix B): 1 ft = 0.3048 m; 1 lbf =
 * 4.4482216152605 N; a kip is 1000 lbf. A weight in kip becomes a mass through standard gravity,
 * g = 9.80665 m/s^2 (CGPM 1901), so 1 kip of seismic weight = 453.59237 kg.
 */
const FOOT = 0.3048;
const KIP = 4448.2216152605;
const G = 9.80665;

interface Column {
  key: 'label' | 'height' | 'mass' | 'stiffness';
  /** The header as the template writes it. */
  header: string;
  /** Header words that name this column (lower case, before any unit in parentheses). */
  names: string[];
  unit: string | null;
  toSi: number;
}

export const STOREY_COLUMNS: Record<DisplayUnits, Column[]> = {
  SI: [
    { key: 'label', header: 'Label', names: ['label'], unit: null, toSi: 1 },
    { key: 'height', header: 'Height (m)', names: ['height'], unit: 'm', toSi: 1 },
    { key: 'mass', header: 'Mass (t)', names: ['mass'], unit: 't', toSi: 1000 },
    {
      key: 'stiffness',
      header: 'Stiffness (kN/m)',
      names: ['stiffness'],
      unit: 'kN/m',
      toSi: 1000,
    },
  ],
  US: [
    { key: 'label', header: 'Label', names: ['label'], unit: null, toSi: 1 },
    { key: 'height', header: 'Height (ft)', names: ['height'], unit: 'ft', toSi: FOOT },
    {
      key: 'mass',
      header: 'Seismic weight (kip)',
      names: ['seismic weight', 'weight'],
      unit: 'kip',
      toSi: KIP / G,
    },
    {
      key: 'stiffness',
      header: 'Stiffness (kip/in)',
      names: ['stiffness'],
      unit: 'kip/in',
      toSi: KIP / (FOOT / 12),
    },
  ],
};

/** An invented three-storey example, storey 1 (the base) first, for the templates. */
export const TEMPLATE_EXAMPLE: Record<DisplayUnits, (string | number)[][]> = {
  SI: [
    ['Level 1', 4.2, 420, 600000],
    ['Level 2', 3.6, 400, 540000],
    ['Roof', 3.6, 300, 360000],
  ],
  US: [
    ['Level 1', 14, 925, 3400],
    ['Level 2', 12, 880, 3100],
    ['Roof', 12, 660, 2050],
  ],
};

const split = (header: string) => {
  const match = /^\s*([^(]*?)\s*(?:\((.*)\))?\s*$/.exec(header);
  return { name: (match?.[1] ?? header).toLowerCase(), unit: match?.[2]?.trim() ?? null };
};

/**
 * Reads a storey table (first row the headers, then storey 1 at the base upwards) into SI
 * storeys. Every problem is reported with the spreadsheet's row number (the header is row 1) and
 * the column; that cell is null in `storeys`, so the row can still be brought into the grid and
 * fixed there. Blank rows are skipped.
 */
export function parseStoreyTable(
  { cells, delimiter }: TableCells,
  units: DisplayUnits,
  decimal?: DecimalMark,
): { storeys: ImportedStorey[]; errors: ImportCellError[]; readAs: ImportReadAs } {
  const columns = STOREY_COLUMNS[units];
  const errors: ImportCellError[] = [];
  const nonBlank = cells.filter((row) => row.some((c) => c.trim() !== ''));
  let readAs: ImportReadAs = { delimiter, decimal: decimal ?? null };
  if (nonBlank.length === 0) {
    return {
      storeys: [],
      errors: [{ row: 1, column: 'file', message: 'The file has no rows' }],
      readAs,
    };
  }
  const headerRow = cells.indexOf(nonBlank[0]);
  const headers = nonBlank[0].map(split);
  const at = new Map<Column['key'], number>();
  for (const column of columns) {
    const index = headers.findIndex((h) => column.names.includes(h.name));
    if (index < 0) {
      if (column.key !== 'label') {
        errors.push({
          row: headerRow + 1,
          column: column.header,
          message: `The column "${column.header}" is missing (the ${units} template's headers are ${columns.map((c) => `"${c.header}"`).join(', ')})`,
        });
      }
      continue;
    }
    const given = headers[index].unit;
    if (column.unit && given !== null && given !== column.unit) {
      errors.push({
        row: headerRow + 1,
        column: column.header,
        message: `The column "${nonBlank[0][index].trim()}" is in ${given}, but the ${units} table takes ${column.unit}: choose the other units or convert the column`,
      });
    }
    at.set(column.key, index);
  }
  if (errors.length > 0) return { storeys: [], errors, readAs };

  const dataRows = cells.slice(headerRow + 1);
  const numberAt = columns.filter((c) => c.key !== 'label').map((c) => at.get(c.key) as number);
  readAs = readAsFor(
    dataRows.flatMap((row) => numberAt.map((i) => row[i] ?? '')),
    delimiter,
    decimal,
  );
  const storeys: ImportedStorey[] = [];
  cells.forEach((row, r) => {
    if (r <= headerRow || row.every((c) => c.trim() === '')) return;
    const rowNumber = r + 1;
    const values: ImportedStorey = { label: '', height: null, mass: null, stiffness: null };
    const miscounted = cellCountProblem(row, cells[headerRow], delimiter);
    if (miscounted) {
      // Its cells are shifted: none of them can be trusted to be in its column.
      errors.push({ row: rowNumber, column: 'row', message: miscounted });
      storeys.push(values);
      return;
    }
    for (const column of columns) {
      const index = at.get(column.key);
      const text = index === undefined ? '' : (row[index] ?? '').trim();
      if (column.key === 'label') {
        if (text.length > 60) {
          errors.push({
            row: rowNumber,
            column: column.header,
            message: 'A label can be at most 60 characters',
          });
        }
        values.label = text.slice(0, 60);
        continue;
      }
      const cell = numberCell(text, false, readAs.decimal);
      if ('problem' in cell) {
        errors.push({ row: rowNumber, column: column.header, message: cell.problem });
      } else {
        values[column.key] = cell.value * column.toSi;
      }
    }
    storeys.push(values);
  });
  if (storeys.length === 0 && errors.length === 0) {
    errors.push({
      row: headerRow + 2,
      column: 'file',
      message: 'The table has headers but no storeys',
    });
  }
  if (storeys.length > ANALYSIS_LIMITS.maxStoreys) {
    errors.push({
      row: headerRow + 2 + ANALYSIS_LIMITS.maxStoreys,
      column: 'file',
      message: `At most ${ANALYSIS_LIMITS.maxStoreys} storeys can be analysed`,
    });
  }
  return { storeys, errors, readAs };
}
