/**
 * `npm run bench -w backend` (second part): the response history of a building under a record,
 * all modes, for 50 to 400 storeys and 4,000 to 16,000 steps, as one JSON line per case with the
 * median milliseconds. The target (issue 15): 200 storeys, 8,000 steps (a 40 s record at
 * 0.005 s) under 1 s. The cost grows as storeys x modes x steps for the modal superposition
 * (all modes: storeys^2 x steps) plus modes x steps for the modal oscillators, so doubling the
 * storeys about quadruples it and doubling the steps doubles it; the lines below show it.
 */
import { responseHistory } from '../src/analysis/engine/history/response-history';
import { demoRecord } from '../src/analysis/engine/history/record';
import { recordSpectrum, displayPeriods } from '../src/analysis/engine/history/record-spectrum';
import { building, round, time } from './bench-support';

const TARGET = { storeys: 200, steps: 8000, ms: 1000 };
const CASES: [number, number][] = [
  [50, 8000],
  [100, 8000],
  [200, 4000],
  [200, 8000],
  [200, 16000],
  [400, 8000],
];

/** The demo record repeated to `steps` samples at 0.005 s (only the count and step matter here). */
function record(steps: number) {
  const demo = demoRecord().accelerations;
  return {
    timeStep: 0.005,
    units: 'g' as const,
    accelerations: Array.from({ length: steps }, (_, k) => demo[k % demo.length]),
  };
}

for (const [storeys, steps] of CASES) {
  const request = { storeys: building(storeys), dampingRatio: 0.05, record: record(steps) };
  const repetitions = storeys * steps > 2e6 ? 3 : 5;
  const ms = time(() => responseHistory(request), repetitions, 1);
  const isTarget = storeys === TARGET.storeys && steps === TARGET.steps;
  console.log(
    JSON.stringify({
      responseHistory: { storeys, steps, modes: storeys },
      medianMs: round(ms),
      msPerMillionStoreyModeSteps: round(ms / ((storeys * storeys * steps) / 1e6)),
      repetitions,
      ...(isTarget ? { targetMs: TARGET.ms, meetsTarget: ms < TARGET.ms } : {}),
    }),
  );
}

const spectrumRequest = {
  record: record(8000),
  dampingRatio: 0.05,
  periods: displayPeriods([]),
};
console.log(
  JSON.stringify({
    recordSpectrum: { periods: spectrumRequest.periods.length, steps: 8000 },
    medianMs: round(time(() => recordSpectrum(spectrumRequest), 5, 1)),
  }),
);
