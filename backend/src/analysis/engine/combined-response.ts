import type { CombinedResponse, ModalResponse } from '@tiermode/shared-types';
import {
  combineAbs,
  combineCqc,
  combineSrss,
  paddedToFour,
  strictUpperProducts,
} from './combination';
import type { Storey } from './shear-building';

export type Combination = 'srss' | 'cqc' | 'abs';

/**
 * SRSS, CQC and ABS of every response quantity of the shear building (method.md, "Combining
 * modal maxima"), each quantity combined on its own from its own modal values.
 *
 * Every storey quantity is a fixed linear combination of the modal displacements u or the modal
 * floor forces f, the same for every mode: drift d_i = u_i - u_{i-1}; shear V_i = sum_{j>=i} f_j;
 * overturning moment O_i = O_{i+1} + h_i V_i (modalResponse). The CQC partial sums
 * t = x U (strictUpperProducts, U the strict upper triangle of rho) are linear in x, so a derived
 * quantity's t is that same combination of the t of u or of f. The N^3 kernel therefore runs
 * twice (for u and for f) rather than once per quantity, and each quantity still gets its own
 * x^T rho x = sum x_i (x_i + 2 t_i). The result equals combining each quantity's modal values
 * directly, up to rounding (combined-response.spec.ts checks it).
 */
export function combineModalResponses(
  storeys: readonly Storey[],
  responses: readonly ModalResponse[],
  rho: readonly (readonly number[])[],
): Record<Combination, CombinedResponse> {
  const n = storeys.length;
  const m = responses.length;
  if (m === 0 || rho.length !== m) throw new RangeError('one correlation row is needed per mode');
  const stride = paddedToFour(m);
  const rows = paddedToFour(n);
  const {
    x: [u, f],
    t: [tu, tf],
  } = strictUpperProducts(2, rows, stride, rho, ([displacements, forces]) => {
    responses.forEach((response, mode) => {
      for (let k = 0; k < n; k += 1) {
        displacements[k * stride + mode] = response.displacement[k];
        forces[k * stride + mode] = response.floorForce[k];
      }
    });
  });

  const out = { srss: emptyResponse(n), cqc: emptyResponse(n), abs: emptyResponse(n) };
  const targets = (quantity: QuantityKey): Targets => ({
    srss: out.srss[quantity],
    cqc: out.cqc[quantity],
    abs: out.abs[quantity],
  });
  const displacement = targets('displacement');
  const drift = targets('drift');
  const floorForce = targets('floorForce');
  const storeyShear = targets('storeyShear');
  const overturningMoment = targets('overturningMoment');

  for (let k = 0; k < n; k += 1) {
    const at = k * stride;
    combineRow(u, tu, at, -1, m, displacement, k);
    combineRow(u, tu, at, k > 0 ? at - stride : -1, m, drift, k);
    combineRow(f, tf, at, -1, m, floorForce, k);
  }

  const shearX = new Float64Array(stride);
  const shearT = new Float64Array(stride);
  const momentX = new Float64Array(stride);
  const momentT = new Float64Array(stride);
  for (let k = n - 1; k >= 0; k -= 1) {
    const at = k * stride;
    const h = storeys[k].height;
    for (let i = 0; i < m; i += 1) {
      shearX[i] += f[at + i];
      shearT[i] += tf[at + i];
      momentX[i] += h * shearX[i];
      momentT[i] += h * shearT[i];
    }
    combineRow(shearX, shearT, 0, -1, m, storeyShear, k);
    combineRow(momentX, momentT, 0, -1, m, overturningMoment, k);
  }

  const base = responses.map((r) => [r.baseShear]);
  const baseShear = {
    srss: combineSrss(base)[0],
    cqc: combineCqc(base, rho)[0],
    abs: combineAbs(base)[0],
  };
  for (const method of ['srss', 'cqc', 'abs'] as const) {
    const combined = out[method];
    combined.driftRatio = combined.drift.map((d, i) => d / storeys[i].height);
    combined.baseShear = baseShear[method];
    combined.baseMoment = combined.overturningMoment[0];
  }
  return out;
}

interface Targets {
  srss: number[];
  cqc: number[];
  abs: number[];
}

/**
 * Entry k of the three combinations of the row of x (and its strict-upper products t) at `at`,
 * or of that row minus the row at `minus` when `minus` >= 0 (a drift).
 */
function combineRow(
  x: Float64Array,
  t: Float64Array,
  at: number,
  minus: number,
  m: number,
  into: Targets,
  k: number,
): void {
  let squares = 0;
  let quadratic = 0;
  let absolute = 0;
  for (let i = 0; i < m; i += 1) {
    const value = minus >= 0 ? x[at + i] - x[minus + i] : x[at + i];
    const partial = minus >= 0 ? t[at + i] - t[minus + i] : t[at + i];
    squares += value * value;
    quadratic += value * (value + 2 * partial);
    absolute += Math.abs(value);
  }
  into.srss[k] = Math.sqrt(squares);
  // A sum that rounding leaves a hair below zero is read as zero.
  into.cqc[k] = Math.sqrt(Math.max(0, quadratic));
  into.abs[k] = absolute;
}

type QuantityKey = 'displacement' | 'drift' | 'floorForce' | 'storeyShear' | 'overturningMoment';

function emptyResponse(n: number): CombinedResponse {
  return {
    displacement: new Array<number>(n),
    drift: new Array<number>(n),
    driftRatio: [],
    floorForce: new Array<number>(n),
    storeyShear: new Array<number>(n),
    overturningMoment: new Array<number>(n),
    baseShear: 0,
    baseMoment: 0,
  };
}
