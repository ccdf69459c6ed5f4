import { fromDisplay, type UnitSystem } from '@/lib/units';
import { newRowId, type StoreyRow } from './storey-rows';

export interface PasteResult {
  rows: StoreyRow[];
  errors: string[];
}

/**
 * Reads a block copied from a spreadsheet: one storey a line, from storey 1 (the base) up, with
 * the columns label, height, mass (or weight, in US units) and stiffness in the units shown, or the
 * same without the label. Cells are separated by tabs, commas or semicolons; a first line that is
 * not numbers is taken as headings and skipped. Thousands separators are not read.
 */
export function parseStoreyBlock(text: string, system: UnitSystem): PasteResult {
  const lines = text
    .split(/\r?\n/)
    .map((line) => line.trim())
    .filter((line) => line.length > 0);
  const rows: StoreyRow[] = [];
  const errors: string[] = [];
  lines.forEach((line, index) => {
    const cells = line.split(/\t|;|,(?=\s*[-+.\d])|,\s*$/).map((c) => c.trim());
    const numeric = (cell: string) => /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(cell);
    const hasLabel = cells.length >= 4;
    const values = hasLabel ? cells.slice(1, 4) : cells.slice(0, 3);
    if (index === 0 && !values.every(numeric)) return; // headings
    const lineNo = index + 1;
    if (values.length < 3) {
      errors.push(
        `Line ${lineNo}: needs height, mass and stiffness (found ${values.length} values)`,
      );
      return;
    }
    const names = ['height', system === 'US' ? 'weight' : 'mass', 'stiffness'];
    const numbers = values.map(Number);
    const bad = values.findIndex((v, i) => !numeric(v) || !(numbers[i] > 0));
    if (bad !== -1) {
      errors.push(`Line ${lineNo}: ${names[bad]} "${values[bad]}" is not a positive number`);
      return;
    }
    rows.push({
      id: newRowId(),
      label: hasLabel ? cells[0] : '',
      height: fromDisplay(system, 'length', numbers[0]),
      mass: fromDisplay(system, 'mass', numbers[1]),
      stiffness: fromDisplay(system, 'stiffness', numbers[2]),
    });
  });
  if (rows.length === 0 && errors.length === 0) errors.push('No storeys found in the pasted text');
  return { rows, errors };
}
