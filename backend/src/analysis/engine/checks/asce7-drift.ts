import type { CheckResult } from './result';

export type RiskCategory = 'I' | 'II' | 'III' | 'IV';

/** delta_x = Cd delta_xe / Ie (12.8.6, Eq. 12.8-15). */
export function amplifiedDrift(elasticDrift: number, cd: number, ie: number): number {
  return (cd * elasticDrift) / ie;
}

/**
 * The allowable storey drift over the storey height, Table 12.12-1, "all other structures"
 * (from memory): 0.020 for risk categories I and II, 0.015 for III, 0.010 for IV.
 */
export function allowableDriftRatio(category: RiskCategory): number {
  return category === 'IV' ? 0.01 : category === 'III' ? 0.015 : 0.02;
}

export function driftCheck(
  designDrift: number,
  storeyHeight: number,
  category: RiskCategory,
): CheckResult<{ ratio: number; limit: number }> {
  const ratio = designDrift / storeyHeight;
  const limit = allowableDriftRatio(category);
  return {
    value: { ratio, limit },
    pass: ratio <= limit,
    clause: 'ASCE 7-22 12.12.1, Table 12.12-1',
  };
}

export type PDeltaConsequence = 'may be neglected' | 'must be included' | 'exceeds the limit';

/**
 * theta = Px Delta Ie / (Vx hsx Cd) (12.8.7, Eq. 12.8-16); P-delta may be neglected for
 * theta <= 0.10; theta_max = 0.5 / (beta Cd) <= 0.25 (Eq. 12.8-17), beta taken as 1 unless given.
 */
export function stabilityCoefficient(input: {
  gravityLoad: number;
  designDrift: number;
  ie: number;
  storeyShear: number;
  storeyHeight: number;
  cd: number;
  beta?: number;
}): CheckResult<{ theta: number; thetaMax: number; consequence: PDeltaConsequence }> {
  const { gravityLoad, designDrift, ie, storeyShear, storeyHeight, cd, beta = 1 } = input;
  const theta = (gravityLoad * designDrift * ie) / (storeyShear * storeyHeight * cd);
  const thetaMax = Math.min(0.5 / (beta * cd), 0.25);
  const consequence: PDeltaConsequence =
    theta <= 0.1
      ? 'may be neglected'
      : theta <= thetaMax
        ? 'must be included'
        : 'exceeds the limit';
  return {
    value: { theta, thetaMax, consequence },
    pass: theta <= thetaMax,
    clause: 'ASCE 7-22 12.8.7',
  };
}
