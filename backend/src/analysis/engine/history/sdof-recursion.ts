import { expm, matrix } from './mathjs';

/**
 * The exact step of a damped single-degree-of-freedom oscillator under a ground acceleration that
 * is linear between samples (Nigam and Jennings 1969, "Calculation of response spectra from
 * strong-motion earthquake records", BSSA 59(2); Chopra, Dynamics of Structures, chapter 5,
 * "interpolation of excitation"):
 *
 *   D'' + 2 zeta omega D' + omega^2 D = -a_g(t),
 *   [D, V]_(k+1) = A [D, V]_k + b a_k + c a_(k+1)
 *
 * with no time-stepping error: for a piecewise-linear a_g the recursion is the closed-form
 * solution at the samples. The coefficients are the exponential of the augmented system
 * z = [D, V, p, p'] with p = -a_g linear in the step (Van Loan 1978, "Computing integrals
 * involving the matrix exponential", IEEE Trans. Automatic Control 23(3)), taken with mathjs's
 * Pade `expm`: the printed closed forms lose digits to cancellation when omega dt is small
 * (long periods at fine steps; about 1e-6 relative at omega dt = 1e-5), the exponential does not.
 */
export interface SdofStep {
  /** D_(k+1) = dd D_k + dv V_k + da a_k + da1 a_(k+1) */
  dd: number;
  dv: number;
  da: number;
  da1: number;
  /** V_(k+1) = vd D_k + vv V_k + va a_k + va1 a_(k+1) */
  vd: number;
  vv: number;
  va: number;
  va1: number;
}

/** The recursion's coefficients for circular frequency omega (rad/s), damping ratio zeta, step dt (s). */
export function sdofStep(omega: number, zeta: number, dt: number): SdofStep {
  if (!(omega > 0) || !(zeta >= 0 && zeta < 1) || !(dt > 0)) {
    throw new RangeError('sdofStep needs omega > 0, 0 <= zeta < 1 and dt > 0');
  }
  const f = [
    [0, dt, 0, 0],
    [-omega * omega * dt, -2 * zeta * omega * dt, dt, 0],
    [0, 0, 0, dt],
    [0, 0, 0, 0],
  ];
  const e = expm(matrix(f)).toArray() as number[][];
  // x_(k+1) = E_xx x_k + E_xp p_k + E_xq p'_k with p' = (p_(k+1) - p_k) / dt and p = -a.
  const step = {
    dd: e[0][0],
    dv: e[0][1],
    da: -(e[0][2] - e[0][3] / dt),
    da1: -e[0][3] / dt,
    vd: e[1][0],
    vv: e[1][1],
    va: -(e[1][2] - e[1][3] / dt),
    va1: -e[1][3] / dt,
  };
  if (!Object.values(step).every(Number.isFinite)) {
    throw new RangeError('a mode or period is too far from the record step to integrate');
  }
  return step;
}

/**
 * The relative displacement D (m) at every sample of the ground acceleration `ag` (m/s^2), from
 * rest; written into `out` at `out[offset + k * stride]` (so several oscillators can share one
 * step-major array). Returns the largest |D| and its sample. `step` is for the record's step
 * divided by `sub`: with sub > 1 each step is walked in `sub` equal parts, the record still
 * linear between its samples (so still exact), and the peak is looked for at every part.
 */
export function sdofDisplacements(
  step: SdofStep,
  ag: ArrayLike<number>,
  out?: Float64Array,
  offset = 0,
  stride = 1,
  sub = 1,
): { peak: number; at: number } {
  const { dd, dv, da, da1, vd, vv, va, va1 } = step;
  let d = 0;
  let v = 0;
  let peak = 0;
  let at = 0;
  if (out) out[offset] = 0;
  for (let k = 0; k + 1 < ag.length; k++) {
    const from = ag[k];
    const rise = (ag[k + 1] - from) / sub;
    for (let part = 0; part < sub; part++) {
      const a0 = from + rise * part;
      const a1 = part + 1 === sub ? ag[k + 1] : a0 + rise;
      const dNext = dd * d + dv * v + da * a0 + da1 * a1;
      v = vd * d + vv * v + va * a0 + va1 * a1;
      d = dNext;
      const size = Math.abs(d);
      if (size > peak) {
        peak = size;
        at = k + (part + 1) / sub;
      }
    }
    if (out) out[offset + (k + 1) * stride] = d;
  }
  return { peak, at };
}

/**
 * Parts per record step that put at least 60 of them in the period T (s): the largest |D| found
 * at the parts is then within 1 - cos(pi / 60), about 0.14 %, of the true peak. At most 200.
 */
export function partsPerStep(period: number, dt: number): number {
  return Math.min(200, Math.max(1, Math.ceil((60 * dt) / period)));
}
