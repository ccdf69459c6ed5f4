import { ANALYSIS_LIMITS, type StoreyInput } from '@tiermode/shared-types';

/** One row of the storey table; values in SI base units (NaN where the cell is not a number). */
export interface StoreyRow {
  id: string;
  label: string;
  height: number;
  mass: number;
  stiffness: number;
}

export interface CellProblem {
  rowId: string;
  field: 'height' | 'mass' | 'stiffness';
  message: string;
}

const FIELD_WORDS = { height: 'height', mass: 'mass', stiffness: 'stiffness' } as const;

let counter = 0;
/** A fresh row id; rows keep their id when storeys are inserted or moved. */
export function newRowId(): string {
  counter += 1;
  return `storey-${Date.now().toString(36)}-${counter}`;
}

/** What is wrong with each cell, named by storey (1 = the base) and field. */
export function storeyProblems(rows: readonly StoreyRow[]): CellProblem[] {
  const problems: CellProblem[] = [];
  rows.forEach((row, i) => {
    for (const field of ['height', 'mass', 'stiffness'] as const) {
      const value = row[field];
      if (!Number.isFinite(value) || value <= 0) {
        problems.push({
          rowId: row.id,
          field,
          message: `Storey ${i + 1}: ${FIELD_WORDS[field]} must be a positive number`,
        });
      }
    }
  });
  if (rows.length > ANALYSIS_LIMITS.maxStoreys) {
    problems.push({
      rowId: rows[rows.length - 1].id,
      field: 'height',
      message: `At most ${ANALYSIS_LIMITS.maxStoreys} storeys can be analysed`,
    });
  }
  return problems;
}

/** The rows as the API takes them; a blank label is left out. */
export function toStoreyInputs(rows: readonly StoreyRow[]): StoreyInput[] {
  return rows.map(({ label, mass, stiffness, height }) => ({
    ...(label.trim() ? { label: label.trim() } : {}),
    mass,
    stiffness,
    height,
  }));
}

/** Rows for the storey table from stored storeys, each with a fresh row id. */
export function fromStoreyInputs(storeys: readonly StoreyInput[]): StoreyRow[] {
  return storeys.map((s) => ({
    id: newRowId(),
    label: s.label ?? '',
    height: s.height,
    mass: s.mass,
    stiffness: s.stiffness,
  }));
}

/** Elevation of each level (m): H_i = h_1 + ... + h_i. */
export function elevations(rows: readonly { height: number }[]): number[] {
  let sum = 0;
  return rows.map((r) => (sum += r.height));
}

/** An invented five-storey office block, to start from. */
export function startingBuilding(): StoreyRow[] {
  const data: [number, number, number][] = [
    [4.2, 420_000, 6.0e8],
    [3.6, 400_000, 5.4e8],
    [3.6, 400_000, 5.0e8],
    [3.6, 390_000, 4.4e8],
    [3.6, 300_000, 3.6e8],
  ];
  return data.map(([height, mass, stiffness], i) => ({
    id: newRowId(),
    label: i === data.length - 1 ? 'Roof' : `Level ${i + 1}`,
    height,
    mass,
    stiffness,
  }));
}
