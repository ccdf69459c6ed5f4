import { STANDARD_GRAVITY, type ModalResponse } from '@tiermode/shared-types';
import type { Mode } from './modes';
import type { Storey } from './shear-building';

/** Standard gravity, m/s^2 (the conventional value, CGPM 1901), from the one unit table. */
export { STANDARD_GRAVITY };

/**
 * The maxima of one mode for the spectral acceleration Sa (g) at its period (method.md,
 * "Spectrum and modal maxima"), with A_n = Sa g:
 * floor force f_n = Gamma_n M phi_n A_n; displacement u_n = Gamma_n phi_n A_n / omega_n^2;
 * drift d_i = u_i - u_{i-1}; storey shear V_i = sum_{j>=i} f_j; overturning moment at the base
 * of storey i, O_i = sum_{j>=i} f_j (H_j - H_{i-1}) = O_{i+1} + h_i V_i; base shear M*_n A_n.
 * Source: Chopra, Dynamics of Structures, chapter 13 (response spectrum analysis of MDF systems).
 */
export function modalResponse(storeys: readonly Storey[], mode: Mode, sa: number): ModalResponse {
  const n = storeys.length;
  const acceleration = sa * STANDARD_GRAVITY;
  const gammaA = mode.participationFactor * acceleration;
  const omega2 = mode.circularFrequency * mode.circularFrequency;
  const displacement = mode.shape.map((p) => (gammaA * p) / omega2);
  const drift = displacement.map((u, i) => u - (i > 0 ? displacement[i - 1] : 0));
  const floorForce = mode.shape.map((p, i) => gammaA * storeys[i].mass * p);
  const storeyShear = new Array<number>(n);
  const overturningMoment = new Array<number>(n);
  let shear = 0;
  let moment = 0;
  for (let i = n - 1; i >= 0; i -= 1) {
    shear += floorForce[i];
    moment += storeys[i].height * shear;
    storeyShear[i] = shear;
    overturningMoment[i] = moment;
  }
  return {
    displacement,
    drift,
    floorForce,
    storeyShear,
    overturningMoment,
    baseShear: mode.effectiveMass * acceleration,
  };
}
