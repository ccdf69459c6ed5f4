import type { AnalysisRequest } from '@tiermode/shared-types';
import { startingBuilding, toStoreyInputs } from './storey-rows';

/** An invented five-storey building and spectrum, for a new analysis or calc to start from. */
export const STARTING_INPUTS: AnalysisRequest = {
  storeys: toStoreyInputs(startingBuilding()),
  spectrum: {
    points: [
      { period: 0, sa: 0.4 },
      { period: 0.12, sa: 1.0 },
      { period: 0.6, sa: 1.0 },
      { period: 1.2, sa: 0.5 },
      { period: 2.4, sa: 0.25 },
      { period: 4, sa: 0.15 },
    ],
    interpolation: 'linear',
  },
  dampingRatio: 0.05,
};
