import type { AnalysisRequest, AnalysisResponse, ModeResult } from '@tiermode/shared-types';
import { correlationMatrix } from './combination';
import { combineModalResponses } from './combined-response';
import { modalResponse } from './modal-response';
import { selectModeCount } from './mode-selection';
import { lowestModes, naturalModes, type Mode } from './modes';
import { assertStoreys, type Storey } from './shear-building';
import { assertSpectrum, spectralAcceleration } from './spectrum';
import { analysisWarnings, type CodeBasisCode } from './analysis-warnings';
import { plausibilityFlags } from './plausibility';
import { beyondTheTable } from './spectrum-source';

/** Bumped whenever a change to the engine could change a number it returns. */
export const ENGINE_VERSION = '1.1.0';

/**
 * Checks everything about the inputs that can be checked before solving: the storeys, the
 * spectrum table, the damping ratio and the interpolation. The mode selection is checked against
 * the number of modes when the analysis runs. Throws TypeError/RangeError naming the field.
 */
export function assertAnalysisRequest(request: AnalysisRequest): void {
  const { storeys, spectrum, dampingRatio } = request;
  assertStoreys(storeys);
  assertSpectrum(spectrum?.points);
  if (typeof dampingRatio !== 'number' || !(dampingRatio > 0 && dampingRatio < 1)) {
    throw new RangeError('dampingRatio must be greater than 0 and less than 1');
  }
  const interpolation = spectrum.interpolation ?? 'linear';
  if (interpolation !== 'linear' && interpolation !== 'log-log') {
    throw new RangeError('spectrum.interpolation must be "linear" or "log-log"');
  }
  if (request.modeCount !== undefined && request.modeCount > storeys.length) {
    throw new RangeError(
      `modeCount must be a whole number from 1 to ${storeys.length} (the number of storeys)`,
    );
  }
}

/**
 * The whole modal response spectrum analysis of a shear building: modes, spectral values,
 * modal maxima, and their SRSS, CQC and ABS combinations (method.md). Pure: the input is not
 * changed. Throws TypeError/RangeError naming the field when the input is not valid.
 * All modes are solved by default; where the request keeps fewer (`modeCount`, or
 * `targetMassRatio`, the fewest modes reaching that cumulative effective mass ratio), only those
 * are solved (lowestModes). `solveModes` replaces the eigensolution: the benchmark swaps in a
 * general dense solver to compare, and the tests the all-modes solver.
 */
export function analyse(
  request: AnalysisRequest,
  solveModes?: (storeys: readonly Storey[]) => Mode[],
  /** The calc's code basis, whose clauses the warnings cite. */
  codeBasis?: CodeBasisCode,
): AnalysisResponse {
  assertAnalysisRequest(request);
  const { storeys, spectrum, dampingRatio } = request;
  const interpolation = spectrum.interpolation ?? 'linear';
  const selection = { modeCount: request.modeCount, targetMassRatio: request.targetMassRatio };
  const truncated = selection.modeCount !== undefined || selection.targetMassRatio !== undefined;
  const solved = solveModes
    ? solveModes(storeys)
    : truncated
      ? lowestModes(storeys, selection)
      : naturalModes(storeys);
  const used = solved.slice(0, selectModeCount(solved, selection));
  const end = beyondTheTable(spectrum);
  const lastPeriod = spectrum.points[spectrum.points.length - 1].period;
  const modes: ModeResult[] = used.map((mode) => {
    const sa =
      end.kind === 'formula' && mode.period > lastPeriod
        ? end.sa(mode.period)
        : spectralAcceleration(spectrum.points, mode.period, interpolation).sa;
    return {
      number: mode.number,
      period: mode.period,
      frequency: mode.frequency,
      circularFrequency: mode.circularFrequency,
      shape: mode.shape,
      shapeNormalisation: mode.shapeNormalisation,
      normalisationLevel: mode.normalisationLevel,
      participationFactor: mode.participationFactor,
      effectiveMass: mode.effectiveMass,
      effectiveMassRatio: mode.effectiveMassRatio,
      cumulativeMassRatio: mode.cumulativeMassRatio,
      sa,
      response: modalResponse(storeys, mode, sa),
    };
  });

  const warnings = analysisWarnings(
    used,
    {
      first: spectrum.points[0].period,
      last: lastPeriod,
      formulaBeyond: end.kind === 'formula' ? end.basis : undefined,
      editedAtPoint: end.kind === 'edited' ? end.point : undefined,
    },
    codeBasis,
    storeys.map((s) => s.mass),
  );

  const correlation = correlationMatrix(
    used.map((m) => m.circularFrequency),
    dampingRatio,
  );
  const totalMass = storeys.reduce((sum, s) => sum + s.mass, 0);
  const combined = combineModalResponses(
    storeys,
    modes.map((m) => m.response),
    correlation,
  );
  assertFiniteResults(combined);
  return {
    totalMass,
    modes,
    availableModes: storeys.length,
    combined,
    correlation,
    warnings,
    plausibility: plausibilityFlags(storeys, modes[0], combined.cqc),
    engineVersion: ENGINE_VERSION,
  };
}

/**
 * Inputs legal one by one (an Sa of 1e300 g, say) can still overflow double precision on the
 * way. ABS bounds every modal value (a finite sum of absolute values has finite terms), and SRSS
 * and CQC square them, so these three being finite means the whole answer is.
 */
function assertFiniteResults(combined: AnalysisResponse['combined']): void {
  for (const response of [combined.abs, combined.srss, combined.cqc]) {
    const values = [
      response.baseShear,
      response.baseMoment,
      ...response.displacement,
      ...response.drift,
      ...response.driftRatio,
      ...response.floorForce,
      ...response.storeyShear,
      ...response.overturningMoment,
    ];
    if (!values.every(Number.isFinite)) {
      throw new RangeError(
        'the results overflow double precision (above 1e308): check the units of spectrum.points sa (g), storeys mass (kg) and stiffness (N/m)',
      );
    }
  }
}
