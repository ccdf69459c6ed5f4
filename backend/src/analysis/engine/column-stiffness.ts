import type { ColumnFixity, ColumnGroupInput } from '@tiermode/shared-types';

/** A group of identical columns of a storey (E in Pa, I in m^4). */
export type ColumnGroup = ColumnGroupInput;

/** c in k = c E I / h^3: 12 with both ends fixed against rotation, 3 with one end pinned. */
export const FIXITY_COEFFICIENT: Readonly<Record<ColumnFixity, number>> = {
  'fixed-fixed': 12,
  'fixed-pinned': 3,
};

/**
 * Lateral stiffness of a storey from its columns: k = sum over columns of c E I / h^3, with
 * c = 12 for both ends fixed against rotation and c = 3 for one end pinned (standard beam theory;
 * e.g. Chopra, Dynamics of Structures, chapter 1, lateral stiffness of a one-storey frame).
 *
 * @param height storey height h, m
 * @returns N/m
 */
export function storeyStiffnessFromColumns(
  columns: readonly ColumnGroup[],
  height: number,
): number {
  if (!Number.isFinite(height) || height <= 0) {
    throw new RangeError('height must be a positive number');
  }
  if (columns.length === 0) throw new RangeError('columns must list at least one column group');
  return columns.reduce((sum, column, i) => {
    for (const field of ['elasticModulus', 'secondMoment'] as const) {
      if (!Number.isFinite(column[field]) || column[field] <= 0) {
        throw new RangeError(`columns[${i}].${field} must be a positive number`);
      }
    }
    if (!Number.isInteger(column.count) || column.count < 1) {
      throw new RangeError(`columns[${i}].count must be a whole number of at least 1`);
    }
    const c = FIXITY_COEFFICIENT[column.fixity];
    if (c === undefined) {
      throw new RangeError(`columns[${i}].fixity must be "fixed-fixed" or "fixed-pinned"`);
    }
    return sum + (column.count * c * column.elasticModulus * column.secondMoment) / height ** 3;
  }, 0);
}
