import type { Mode } from './modes';

export interface ModeSelection {
  /** The first n modes. */
  modeCount?: number;
  /** The fewest modes whose cumulative effective mass ratio reaches this. */
  targetMassRatio?: number;
}

/**
 * How many of the modes to combine: all (the default), the first n, or the fewest reaching a
 * target cumulative effective mass ratio (all of them if none does).
 */
export function selectModeCount(modes: readonly Mode[], selection: ModeSelection = {}): number {
  const { modeCount, targetMassRatio } = selection;
  assertModeSelection(selection, modes.length);
  if (modeCount !== undefined) return modeCount;
  if (targetMassRatio !== undefined) {
    // Rounding may leave the cumulative sum of all modes a hair below 1.
    const reached = modes.findIndex((m) => m.cumulativeMassRatio >= targetMassRatio - 1e-12);
    return reached === -1 ? modes.length : reached + 1;
  }
  return modes.length;
}

/** Refuses a selection that cannot apply to a building of `storeys` storeys, naming the field. */
export function assertModeSelection(selection: ModeSelection, storeys: number): void {
  const { modeCount, targetMassRatio } = selection;
  if (modeCount !== undefined && targetMassRatio !== undefined) {
    throw new RangeError('give modeCount or targetMassRatio, not both');
  }
  if (
    modeCount !== undefined &&
    (!Number.isInteger(modeCount) || modeCount < 1 || modeCount > storeys)
  ) {
    throw new RangeError(
      `modeCount must be a whole number from 1 to ${storeys} (the number of storeys)`,
    );
  }
  if (targetMassRatio !== undefined && !(targetMassRatio > 0 && targetMassRatio <= 1)) {
    throw new RangeError('targetMassRatio must be greater than 0 and at most 1');
  }
}
