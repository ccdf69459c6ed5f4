import {
  DELIMITER_CHARACTERS,
  DELIMITER_WORDS,
  decimalEvidence,
  detectDecimalMark,
  detectDelimiter,
  numberUnder,
  type DecimalMark,
  type Delimiter,
} from '@tiermode/shared-types';
import Papa from 'papaparse';
import { fromDisplay, type UnitSystem } from '@/lib/units';
import { newRowId, type StoreyRow } from './storey-rows';

/** How the block is read: each part found in the text unless the person chose it. */
export interface ReadAs {
  delimiter: Delimiter;
  /** Null: no cell settles it (then cells that read two ways are refused as ambiguous). */
  decimal: DecimalMark | null;
}

export interface ReadOptions {
  delimiter?: Delimiter;
  decimal?: DecimalMark;
  /**
   * The mark to use where no cell settles it. The storey grid passes its own (the browser's
   * locale, which formats its numbers), so cells copied from it read back as they were shown.
   */
  fallbackDecimal?: DecimalMark;
}

/** The decimal mark the browser's locale writes, which the grids use to show numbers. */
export function localeDecimalMark(): DecimalMark {
  return (1.5).toLocaleString().includes(',') ? 'comma' : 'point';
}

export interface PasteResult {
  rows: StoreyRow[];
  /** "Row 3, mass: ..." (rows counted as in the pasted text, headings included). */
  errors: string[];
  readAs: ReadAs;
}

export type StoreyField = 'label' | 'height' | 'mass' | 'stiffness';
const NUMBER_FIELDS = ['height', 'mass', 'stiffness'] as const;
type NumberField = (typeof NUMBER_FIELDS)[number];

const COMMA_IN_A_NUMBER =
  'a comma inside a number (a thousands separator or a decimal comma)? Separate the columns with tabs or semicolons';

/** The columns as the storey grid names them in these units. */
function fieldNames(system: UnitSystem): Record<StoreyField, string> {
  return {
    label: 'label',
    height: 'height',
    mass: system === 'US' ? 'weight' : 'mass',
    stiffness: 'stiffness',
  };
}

/** One storey value in SI from a cell in the units shown, or why not ("mass: ..."). */
function readStoreyValue(
  field: NumberField,
  cell: string,
  decimal: DecimalMark | null,
  system: UnitSystem,
): { value: number } | { problem: string } {
  const name = fieldNames(system)[field];
  const read = numberUnder(cell, decimal);
  if ('problem' in read) return { problem: `${name}: ${read.problem}` };
  if (!(read.value > 0)) return { problem: `${name}: ${cell} must be more than 0` };
  return { value: fromDisplay(system, field === 'height' ? 'length' : field, read.value) };
}

/** The text cut into lines of cells, with the delimiter used and the lines' numbers. */
export function splitBlock(
  text: string,
  delimiter?: Delimiter,
): { lines: { number: number; cells: string[] }[]; delimiter: Delimiter } {
  const all = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  const numbered = all
    .map((line, i) => ({ number: i + 1, line }))
    .filter(({ line }) => line.trim() !== '');
  const chosen =
    delimiter ??
    detectDelimiter(
      numbered.map((l) => l.line),
      'space',
    );
  const lines = numbered.map(({ number, line }) => ({
    number,
    cells:
      chosen === 'space'
        ? line.trim().split(/\s+/)
        : (
            Papa.parse<string[]>(line, { delimiter: DELIMITER_CHARACTERS[chosen] }).data[0] ?? []
          ).map((cell) => cell.trim()),
  }));
  return { lines, delimiter: chosen };
}

/**
 * Reads a block copied from a spreadsheet (or from this app's own storey grid): one storey a
 * line, from storey 1 (the base) up, with the columns label, height, mass (or weight, in US
 * units) and stiffness in the units shown, or the same without the label. The column separator
 * and the decimal mark are found in the text (tab, semicolon, comma or spaces; decimal point or
 * decimal comma, thousands grouped by the other mark, spaces or apostrophes) unless given.
 * A first line that is not numbers is taken as headings; every line must have as many cells as
 * the first. A line with any cell that cannot be read is left out and named, row and column.
 */
export function parseStoreyBlock(
  text: string,
  system: UnitSystem,
  options: ReadOptions = {},
): PasteResult {
  const { lines, delimiter } = splitBlock(text, options.delimiter);
  const rows: StoreyRow[] = [];
  const errors: string[] = [];
  const names = fieldNames(system);
  const first = lines[0];
  const numbersIn = (cells: string[]) => cells.slice(cells.length >= 4 ? 1 : 0);
  // The decimal mark from every cell that would hold a number.
  const decimal =
    options.decimal ?? detectDecimalMark(lines.flatMap(({ cells }) => numbersIn(cells)));
  const readAs: ReadAs = { delimiter, decimal };
  if (!first) return { rows, errors: ['No storeys found in the pasted text'], readAs };
  const width = first.cells.length;
  const headings = numbersIn(first.cells).every((cell) => decimalEvidence(cell) === 'neither');
  const fields: StoreyField[] =
    width === 4 ? ['label', ...NUMBER_FIELDS] : width === 3 ? [...NUMBER_FIELDS] : [];
  if (fields.length === 0) {
    return {
      rows,
      errors: [
        `Row ${first.number}: ${width} cell(s) separated by ${DELIMITER_WORDS[delimiter]}, where a storey has 3 or 4 (label, height, ${names.mass}, stiffness)${
          width > 4 && delimiter === 'comma' ? `: ${COMMA_IN_A_NUMBER}` : ''
        }`,
      ],
      readAs,
    };
  }
  for (const { number, cells } of headings ? lines.slice(1) : lines) {
    if (cells.length !== width) {
      errors.push(
        `Row ${number}: ${cells.length} cells where the ${headings ? 'headings have' : 'first row has'} ${width}: ${
          delimiter === 'comma' ? COMMA_IN_A_NUMBER : 'check the separators in this row'
        }`,
      );
      continue;
    }
    const row: StoreyRow = { id: newRowId(), label: '', height: 0, mass: 0, stiffness: 0 };
    const problems: string[] = [];
    fields.forEach((field, i) => {
      const cell = cells[i] ?? '';
      if (field === 'label') {
        row.label = cell.slice(0, 60);
        return;
      }
      const read = readStoreyValue(field, cell, decimal, system);
      if ('problem' in read) problems.push(read.problem);
      else row[field] = read.value;
    });
    if (problems.length > 0) errors.push(...problems.map((p) => `Row ${number}, ${p}`));
    else rows.push(row);
  }
  if (rows.length === 0 && errors.length === 0) errors.push('No storeys found in the pasted text');
  return { rows, errors, readAs };
}

/**
 * The storey table as tab-separated text with headings, every value in full (no thousands
 * separators, no rounding), in the units shown: what "Copy the table" puts on the clipboard and
 * what parseStoreyBlock reads back to the same numbers.
 */
export function storeyBlockText(
  rows: readonly StoreyRow[],
  headings: readonly string[],
  toShown: (field: NumberField, value: number) => number,
): string {
  const lines = rows.map((row) =>
    [
      row.label.replace(/[\t\r\n]/g, ' '),
      ...NUMBER_FIELDS.map((f) => String(toShown(f, row[f]))),
    ].join('\t'),
  );
  return [headings.join('\t'), ...lines].join('\n');
}

const FIELD_ORDER: readonly StoreyField[] = ['label', ...NUMBER_FIELDS];

/**
 * Cells pasted straight into the storey grid (Ctrl+V on a cell): the block's top-left cell lands
 * on the focused cell, its columns fill the fields to the right in the grid's order (label,
 * height, mass, stiffness) and its lines the storeys upwards, adding storeys on top where the
 * block runs past the roof. All or nothing: any cell that cannot be read leaves the table as it
 * was and is named, row and column.
 */
export function pasteIntoTable(
  rows: readonly StoreyRow[],
  text: string,
  at: { index: number; field: StoreyField },
  system: UnitSystem,
  options: ReadOptions = {},
): { rows: StoreyRow[] | null; errors: string[]; readAs: ReadAs } {
  const { lines, delimiter } = splitBlock(text, options.delimiter);
  const startColumn = FIELD_ORDER.indexOf(at.field);
  const fieldAt = (i: number) => FIELD_ORDER[startColumn + i];
  const numberCells = lines.flatMap(({ cells }) =>
    cells.filter((_, i) => fieldAt(i) !== undefined && fieldAt(i) !== 'label'),
  );
  const decimal =
    options.decimal ?? detectDecimalMark(numberCells) ?? options.fallbackDecimal ?? null;
  const readAs: ReadAs = { delimiter, decimal };
  const names = fieldNames(system);
  const errors: string[] = [];
  const result = rows.map((row) => ({ ...row }));
  // A first line of headings (what "Copy the table" puts first) is skipped, as the dialog does.
  const headings =
    lines.length > 1 &&
    lines[0].cells.every(
      (cell, i) => fieldAt(i) === 'label' || decimalEvidence(cell) === 'neither',
    );
  (headings ? lines.slice(1) : lines).forEach(({ number, cells }, k) => {
    if (startColumn + cells.length > FIELD_ORDER.length) {
      errors.push(
        `Row ${number}: ${cells.length} cells from the ${names[at.field]} column run past the stiffness column`,
      );
      return;
    }
    const index = at.index + k;
    if (index >= result.length) {
      const template = result[result.length - 1];
      result.push({ ...template, id: newRowId(), label: '' });
    }
    cells.forEach((cell, i) => {
      const field = fieldAt(i);
      if (field === 'label') {
        result[index].label = cell.slice(0, 60);
        return;
      }
      const read = readStoreyValue(field, cell, decimal, system);
      if ('problem' in read) errors.push(`Row ${number}, ${read.problem}`);
      else result[index][field] = read.value;
    });
  });
  return { rows: errors.length > 0 ? null : result, errors, readAs };
}
