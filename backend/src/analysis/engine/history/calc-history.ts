import {
  decimated,
  type CalculationInputs,
  type ResponseHistoryResult,
  type ResponseHistorySetup,
} from '@tiermode/shared-types';
import { ENGINE_VERSION } from '../analyse';
import { naturalModes } from '../modes';
import { freeVibration } from './free-vibration';
import { assertRecord } from './record';
import { displayPeriods, recordScaleFactor, recordSpectrum } from './record-spectrum';
import { responseHistory } from './response-history';

/**
 * Checks a calc's response history setup against its storeys: the record (its samples named),
 * its name and origin, and the free vibration's start. Throws TypeError/RangeError naming the
 * field under `history.`.
 */
export function assertHistorySetup(setup: ResponseHistorySetup, levels: number): void {
  assertRecord(setup.record, 'history.record');
  const { name, origin } = setup.record;
  if (typeof name !== 'string' || name.trim() === '' || name.length > 200) {
    throw new RangeError('history.record.name must be text of 1 to 200 characters');
  }
  if (origin !== 'upload' && origin !== 'demo') {
    throw new RangeError('history.record.origin must be "upload" or "demo"');
  }
  const start = setup.freeVibration?.start;
  if (start?.kind === 'shape' && start.displacements.length !== levels) {
    throw new RangeError(
      `history.freeVibration.start.displacements must have one value per level (${levels}); the storeys changed since it was set`,
    );
  }
  if (start?.kind === 'mode' && start.mode > levels) {
    throw new RangeError(
      `history.freeVibration.start.mode must be from 1 to ${levels} (the number of modes); the storeys changed since it was set`,
    );
  }
}

/**
 * A calc's response history, made with its analysis: the record's scale factor, the building's
 * response to the scaled record (all modes, the calc's damping ratio; histories decimated for
 * display), the scaled record's spectrum over 0.02 to 10 s and at the modal periods, and the
 * free vibration's peaks where the calc starts one. Throws TypeError/RangeError naming the field.
 */
export function calcResponseHistory(
  inputs: CalculationInputs,
  setup: ResponseHistorySetup,
): ResponseHistoryResult {
  const levels = inputs.storeys.length;
  assertHistorySetup(setup, levels);
  const { storeys, dampingRatio, spectrum } = inputs;
  const record = {
    timeStep: setup.record.timeStep,
    accelerations: setup.record.accelerations,
    units: setup.record.units,
  };
  const scaling = recordScaleFactor(setup.scaling, record, dampingRatio, spectrum);
  const response = withPath(
    () => responseHistory({ storeys, dampingRatio, record, scale: scaling.factor }),
    'history.',
  );
  const periods = naturalModes(storeys).map((mode) => mode.period);
  const spectrumOfRecord = recordSpectrum({
    record,
    dampingRatio,
    periods: displayPeriods(periods),
    scale: scaling.factor,
  });
  const free = freeVibrationSummary(setup, inputs);
  return {
    scaling,
    response,
    recordSpectrum: spectrumOfRecord,
    ...(free ? { freeVibration: free } : {}),
    engineVersion: ENGINE_VERSION,
  };
}

/** The free vibration's summary where the calc starts one. */
function freeVibrationSummary(
  setup: ResponseHistorySetup,
  inputs: CalculationInputs,
): ResponseHistoryResult['freeVibration'] {
  const setupOf = setup.freeVibration;
  if (!setupOf) return undefined;
  const { start } = setupOf;
  let initialDisplacements: number[];
  let startedFrom: string;
  if (start.kind === 'mode') {
    const mode = naturalModes(inputs.storeys)[start.mode - 1];
    initialDisplacements = mode.shape.map((p) => p * start.amplitude);
    startedFrom = `mode ${start.mode} shape, ${start.amplitude} m at level ${mode.normalisationLevel}`;
  } else {
    initialDisplacements = start.displacements;
    startedFrom = "the engineer's deflected shape";
  }
  const run = withPath(
    () =>
      freeVibration({
        storeys: inputs.storeys,
        dampingRatio: inputs.dampingRatio,
        initialDisplacements,
        duration: setupOf.duration,
        timeStep: setupOf.timeStep,
      }),
    'history.freeVibration.',
  );
  return {
    startedFrom,
    initialDisplacements,
    peaks: run.peaks,
    modes: run.modes.map((m) => ({
      number: m.number,
      period: m.period,
      initialCoordinate: m.initialCoordinate,
      initialCoordinateVelocity: m.initialCoordinateVelocity,
    })),
    roofDisplacement: decimated(
      run.displacements[run.displacements.length - 1],
      setupOf.timeStep,
      2000,
    ),
  };
}

/** The stateless routes' messages name `record.` or the field; a calc's sit under `history.`. */
function withPath<T>(run: () => T, prefix: string): T {
  try {
    return run();
  } catch (error) {
    if (error instanceof RangeError || error instanceof TypeError) {
      const message = `${prefix}${error.message}`;
      throw error instanceof RangeError ? new RangeError(message) : new TypeError(message);
    }
    throw error;
  }
}
