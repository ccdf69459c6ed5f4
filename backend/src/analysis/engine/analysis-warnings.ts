import type { CodeBasisParameters } from '@tiermode/shared-types';

export type CodeBasisCode = CodeBasisParameters['code'];

/** EN 1998-1 4.3.3.3.1 asks the modes used to reach 90% of the mass. */
export const MIN_CUMULATIVE_MASS_RATIO = 0.9;
/** EN 1998-1 4.3.3.3.2: modes i and j are independent when T_j <= 0.9 T_i. */
export const CLOSE_MODE_PERIOD_RATIO = 0.9;
/**
 * A pair of closely spaced modes matters to the combined result only when both carry mass: a
 * mode with less than 1% of the total adds next to nothing to any response (common practice).
 */
export const SIGNIFICANT_MASS_RATIO = 0.01;

/** A level with less than this share of a neighbouring level's mass is named (see below). */
export const NEGLIGIBLE_MASS_RATIO = 1e-6;

export interface ModeForWarnings {
  number: number;
  period: number;
  effectiveMassRatio: number;
  cumulativeMassRatio: number;
  shapeNormalisation?: 'roof' | 'largest';
  normalisationLevel?: number;
}

/** Where the spectrum table starts and ends, s. */
export interface TableRange {
  first: number;
  last: number;
  /** Set where periods past the end took the generator's formula: the clause it follows. */
  formulaBeyond?: string;
  /** Set where the source names a generator the table no longer matches: the first point off. */
  editedAtPoint?: number;
}

/** The clause each warning cites, by the calc's code basis; none: the trade's common practice. */
function clauses(basis: CodeBasisCode | undefined) {
  switch (basis) {
    case 'EN1998-1':
      return {
        mass: 'EN 1998-1:2004 4.3.3.3.1 asks for at least 90%',
        close: 'EN 1998-1:2004 4.3.3.3.2',
      };
    case 'ASCE7-22':
      return {
        mass: 'ASCE 7-22 12.9.1.1 asks for 100%, or a residual mode (clause from memory)',
        close: 'ASCE 7-22 12.9.1.3, clause from memory',
      };
    default:
      return {
        mass: 'common practice asks for at least 90%',
        close: 'common practice: T_j > 0.9 T_i',
      };
  }
}

/**
 * The analysis's warnings, in words an engineer reads: each kind once, the modes it concerns
 * listed (runs of consecutive modes as ranges), closely spaced modes only where both carry mass,
 * and each citing the clause of the calc's own code basis.
 */
export function analysisWarnings(
  modes: readonly ModeForWarnings[],
  table: TableRange,
  basis?: CodeBasisCode,
  /** kg per level, level 1 first: to name levels of negligible mass. */
  masses: readonly number[] = [],
): string[] {
  const cite = clauses(basis);
  const warnings: string[] = [...negligibleMassWarnings(masses)];
  const below = modes.filter((m) => m.period < table.first);
  const above = modes.filter((m) => m.period > table.last);
  // Long periods first: the fundamental modes, which hold most of the mass, are there.
  if (table.editedAtPoint !== undefined) {
    warnings.push(
      `The spectrum table no longer matches its generator (point ${table.editedAtPoint} differs), so it is read as a typed table${above.length > 0 ? ': past its end its last value is used' : ''}.`,
    );
  }
  if (above.length > 0) {
    warnings.push(
      table.formulaBeyond
        ? `${listModes(above)}: ${periods(above)} above the spectrum table (which ends at ${table.last} s); Sa was taken from the generator's own formula there (${table.formulaBeyond}).`
        : `${listModes(above)}: ${periods(above)} above the spectrum table (which ends at ${table.last} s); its last value was used.`,
    );
  }
  if (below.length > 0) {
    warnings.push(
      `${listModes(below)}: ${periods(below)} below the spectrum table (which starts at ${table.first} s); its first value was used.`,
    );
  }
  const reached = modes[modes.length - 1].cumulativeMassRatio;
  if (reached < MIN_CUMULATIVE_MASS_RATIO) {
    warnings.push(
      `The ${modes.length} mode(s) used reach ${(reached * 100).toFixed(1)}% of the total mass; ${cite.mass}.`,
    );
  }
  const pairs: string[] = [];
  for (let i = 1; i < modes.length; i += 1) {
    const [a, b] = [modes[i - 1], modes[i]];
    const close = b.period / a.period > CLOSE_MODE_PERIOD_RATIO;
    const matter = Math.min(a.effectiveMassRatio, b.effectiveMassRatio) >= SIGNIFICANT_MASS_RATIO;
    if (close && matter) {
      pairs.push(
        `${a.number} and ${b.number} (T${b.number}/T${a.number} = ${(b.period / a.period).toFixed(3)})`,
      );
    }
  }
  if (pairs.length > 0) {
    warnings.push(
      `Modes ${pairs.join(', ')} are closely spaced and each holds at least 1% of the mass (${cite.close}): SRSS is not acceptable for them; use CQC.`,
    );
  }
  const byLargest = modes.filter((m) => m.shapeNormalisation === 'largest');
  if (byLargest.length > 0) {
    const levels = byLargest.map((m) => m.normalisationLevel).join(', ');
    warnings.push(
      `${listModes(byLargest)}: the roof barely moves (less than a millionth of the largest component), so ${byLargest.length === 1 ? 'the shape is' : 'each shape is'} +1 at its largest component (level ${levels}) and the participation factor is for that shape.`,
    );
  }
  return warnings;
}

/**
 * Levels whose mass is negligible beside a neighbour's. The engine keeps them exactly (its
 * periods hold their relative accuracy however light a level is: shear-building-frequencies.ts),
 * and the answer then equals that of the building with the level statically condensed out, but
 * such a mass is more often a units slip than a design, so it is named.
 */
function negligibleMassWarnings(masses: readonly number[]): string[] {
  const light = masses
    .map((mass, i) => {
      const neighbour = Math.max(masses[i - 1] ?? 0, masses[i + 1] ?? 0);
      return { level: i + 1, ratio: mass / neighbour };
    })
    .filter(({ ratio }) => ratio < NEGLIGIBLE_MASS_RATIO);
  if (light.length === 0) return [];
  const levels = light.map((l) => l.level).join(', ');
  const ratios = light.map((l) => l.ratio.toPrecision(2)).join(', ');
  return [
    `Level${light.length > 1 ? 's' : ''} ${levels} carr${light.length > 1 ? 'y' : 'ies'} a negligible mass (${ratios} of the heavier level beside ${light.length > 1 ? 'each' : 'it'}): the analysis keeps ${light.length > 1 ? 'them' : 'it'} as given, and the results equal those with ${light.length > 1 ? 'those levels' : 'that level'} statically condensed out. Check that the mass is meant (kg).`,
  ];
}

/** "Mode 3" or "Modes 3 to 7, 9": runs of consecutive numbers as ranges. */
function listModes(modes: readonly ModeForWarnings[]): string {
  const runs: [number, number][] = [];
  for (const { number } of modes) {
    const last = runs[runs.length - 1];
    if (last && last[1] === number - 1) last[1] = number;
    else runs.push([number, number]);
  }
  const text = runs.map(([a, b]) => (a === b ? `${a}` : `${a} to ${b}`)).join(', ');
  return `${modes.length === 1 ? 'Mode' : 'Modes'} ${text}`;
}

function periods(modes: readonly ModeForWarnings[]): string {
  const values = modes.map((m) => m.period);
  if (values.length === 1) return `T = ${values[0].toPrecision(4)} s is`;
  const low = Math.min(...values).toPrecision(4);
  const high = Math.max(...values).toPrecision(4);
  return `T from ${low} s to ${high} s are`;
}
