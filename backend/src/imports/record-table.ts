import {
  ACCELERATION_UNIT_FACTORS,
  HISTORY_LIMITS,
  STANDARD_GRAVITY,
  numberUnder,
  type AccelerationUnits,
  type DecimalMark,
  type ImportCellError,
  type RecordImportResponse,
} from '@tiermode/shared-types';
import { nonBlankRows, readAsFor } from './cells';
import type { TableCells } from './read-table';

const ACCELERATION = 'acceleration';
const TIME = 'time';

/**
 * Reads a ground-motion record: one column of accelerations at the time step the user states, or
 * two columns, time (s) and acceleration, at a constant step (the step is read from the times;
 * a time off that step by more than 0.1 % of a step is refused, naming the row). A first row that
 * is not numbers is a header and is skipped. Accelerations are in the units the user chose; they
 * are taken as given (no baseline correction or filtering). Problems name the file's row.
 */
export function parseRecordTable(
  { cells, delimiter }: TableCells,
  options: { units: AccelerationUnits; timeStep?: number; decimal?: DecimalMark; name: string },
): RecordImportResponse {
  // Plain text separated by spaces: runs of spaces are one separator.
  const rowsOfCells =
    delimiter === 'space' ? cells.map((row) => row.filter((cell) => cell.trim() !== '')) : cells;
  const rows = nonBlankRows(rowsOfCells);
  const errors: ImportCellError[] = [];
  const readAs = readAsFor(
    rows.flatMap((r) => rowsOfCells[r]),
    delimiter,
    options.decimal,
  );
  const empty = (message: string, row = 1, column = 'file'): RecordImportResponse => ({
    record: null,
    errors: [{ row, column, message }],
    readAs,
    timeStepFrom: '',
  });
  if (rows.length === 0) return empty('The file has no rows');
  const isNumberRow = (r: number) =>
    rowsOfCells[r].every(
      (cell) => cell.trim() === '' || 'value' in numberUnder(cell.trim(), readAs.decimal),
    );
  const body = isNumberRow(rows[0]) ? rows : rows.slice(1);
  if (body.length === 0) return empty('The file has a header and no values', rows[0] + 1);
  const width = Math.max(...body.map((r) => rowsOfCells[r].filter((c) => c.trim() !== '').length));
  if (width > 2) {
    return empty(
      `Row ${body[0] + 1} has ${width} values: give one column of accelerations, or two columns, time and acceleration`,
      body[0] + 1,
    );
  }
  const twoColumns = width === 2;
  const inG = ACCELERATION_UNIT_FACTORS[options.units] / STANDARD_GRAVITY;
  const times: number[] = [];
  const accelerations: number[] = [];
  for (const r of body) {
    const row = rowsOfCells[r].filter((c) => c.trim() !== '');
    if (row.length !== width) {
      errors.push({
        row: r + 1,
        column: 'row',
        message: `${row.length} values where the rows above have ${width}`,
      });
      continue;
    }
    const read = (text: string, column: string) => {
      const value = numberUnder(text.trim(), readAs.decimal);
      if ('problem' in value) {
        errors.push({
          row: r + 1,
          column,
          message: value.problem.charAt(0).toUpperCase() + value.problem.slice(1),
        });
        return null;
      }
      return value.value;
    };
    const t = twoColumns ? read(row[0], TIME) : 0;
    const a = read(row[twoColumns ? 1 : 0], ACCELERATION);
    if (a !== null && Math.abs(a) * inG > HISTORY_LIMITS.maxAcceleration) {
      errors.push({
        row: r + 1,
        column: ACCELERATION,
        message: `${a} ${options.units} is ${+(Math.abs(a) * inG).toPrecision(3)} g, more than ${HISTORY_LIMITS.maxAcceleration} g: are the units right?`,
      });
      continue;
    }
    if (t !== null && a !== null) {
      times.push(t);
      accelerations.push(a);
    }
  }
  if (accelerations.length > HISTORY_LIMITS.maxRecordSteps) {
    errors.push({
      row: body[HISTORY_LIMITS.maxRecordSteps] + 1,
      column: 'file',
      message: `At most ${HISTORY_LIMITS.maxRecordSteps} values`,
    });
  }
  if (accelerations.length < HISTORY_LIMITS.minRecordSteps && errors.length === 0) {
    errors.push({
      row: body[0] + 1,
      column: 'file',
      message: 'A record needs at least two values',
    });
  }
  let timeStep = options.timeStep;
  let timeStepFrom = timeStep === undefined ? '' : `as given: ${timeStep} s`;
  if (twoColumns && errors.length === 0) {
    const step = (times[times.length - 1] - times[0]) / (times.length - 1);
    if (!(step > 0)) {
      errors.push({ row: body[1] + 1, column: TIME, message: 'The times must increase' });
    } else {
      const off = times.findIndex((t, k) => Math.abs(t - times[0] - k * step) > 1e-3 * step);
      if (off >= 0) {
        errors.push({
          row: body[off] + 1,
          column: TIME,
          message: `${times[off]} s is off the constant step of ${+step.toPrecision(6)} s (a record must be sampled at one step)`,
        });
      }
      if (times[0] !== 0 && off < 0) {
        timeStepFrom = `from the time column: ${+step.toPrecision(6)} s (the first time, ${times[0]} s, is taken as t = 0)`;
      } else {
        timeStepFrom = `from the time column: ${+step.toPrecision(6)} s`;
      }
      if (timeStep !== undefined && Math.abs(timeStep - step) > 1e-3 * step) {
        errors.push({
          row: body[1] + 1,
          column: TIME,
          message: `The times are ${+step.toPrecision(6)} s apart, not the ${timeStep} s given`,
        });
      }
      timeStep = +step.toPrecision(12);
    }
  }
  if (timeStep === undefined && errors.length === 0) {
    errors.push({
      row: body[0] + 1,
      column: 'timeStep',
      message: 'One column of accelerations needs its time step: give it (s)',
    });
  }
  if (
    timeStep !== undefined &&
    (timeStep < HISTORY_LIMITS.minTimeStep || timeStep > HISTORY_LIMITS.maxTimeStep)
  ) {
    errors.push({
      row: body[0] + 1,
      column: 'timeStep',
      message: `The time step must be from ${HISTORY_LIMITS.minTimeStep} to ${HISTORY_LIMITS.maxTimeStep} s (got ${timeStep})`,
    });
  }
  if (errors.length > 0 || timeStep === undefined) {
    return { record: null, errors, readAs, timeStepFrom };
  }
  return {
    record: {
      name: options.name,
      origin: 'upload',
      timeStep,
      units: options.units,
      accelerations,
    },
    errors,
    readAs,
    timeStepFrom,
  };
}
