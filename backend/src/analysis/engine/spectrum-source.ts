import type { SpectrumInput } from '@tiermode/shared-types';
import { generateSpectrum } from './spectrum-generators';

/**
 * How Sa is read past the end of the spectrum table:
 * - `table`: a typed or uploaded table (or no source): the last value, with a warning;
 * - `formula`: a generated table that still matches its generator: the code's own formula
 *   (its long-period branch: SD1 TL / T^2 in ASCE 7, the 1/T^2 branch or the beta ag floor in
 *   EN 1998-1), since the table only stopped where the generator was told to;
 * - `edited`: the source names a generator but point `point` is not what it gives, so the
 *   table was changed after it was made and is read as a typed table.
 */
export type BeyondTheTable =
  | { kind: 'table' }
  | { kind: 'formula'; sa: (period: number) => number; basis: string }
  | { kind: 'edited'; point: number };

/** Agreement of a table value with its formula: rounding in transit only. */
const SAME = 1e-9;

export function beyondTheTable(spectrum: SpectrumInput): BeyondTheTable {
  const source = spectrum.source;
  if (!source || source.kind === 'user') return { kind: 'table' };
  let generated: ReturnType<typeof generateSpectrum>;
  try {
    generated = generateSpectrum({ ...source.parameters, kind: source.kind });
  } catch (error) {
    if (error instanceof RangeError) {
      throw new RangeError(`spectrum.source.parameters: ${error.message}`);
    }
    throw error;
  }
  const differs = spectrum.points.findIndex(({ period, sa }) => {
    const formula = generated.sa(period);
    return !(Math.abs(formula - sa) <= SAME * Math.max(Math.abs(formula), Math.abs(sa)));
  });
  if (differs >= 0) return { kind: 'edited', point: differs + 1 };
  return { kind: 'formula', sa: generated.sa, basis: generated.basis };
}
