/**
 * ASCE 7-22 chapter 12.8, the equivalent lateral force procedure, as method.md states it. Clause
 * and equation numbers are as commonly cited; Table 12.8-1's values are from memory (check them
 * against the edition adopted for the site).
 */

export interface SeismicCoefficientInput {
  /** g */
  sds: number;
  /** g */
  sd1: number;
  /** g */
  s1: number;
  /** s */
  tl: number;
  r: number;
  ie: number;
  /** The period used, s (already capped at Cu Ta). */
  period: number;
}

export type CsEquation = '12.8-2' | '12.8-3' | '12.8-4' | '12.8-5' | '12.8-6';

/**
 * Cs = SDS / (R/Ie) (12.8-2), not more than SD1 / (T R/Ie) for T <= TL (12.8-3) or
 * SD1 TL / (T^2 R/Ie) beyond (12.8-4), not less than max(0.044 SDS Ie, 0.01) (12.8-5), and,
 * where S1 >= 0.6 g, not less than 0.5 S1 / (R/Ie) (12.8-6). Says which equation governs.
 */
export function seismicResponseCoefficient(input: SeismicCoefficientInput): {
  cs: number;
  governs: CsEquation;
  values: Record<CsEquation, number | null>;
} {
  const { sds, sd1, s1, tl, r, ie, period: t } = input;
  const reduction = r / ie;
  const base = sds / reduction;
  const upper = t <= tl ? sd1 / (t * reduction) : (sd1 * tl) / (t * t * reduction);
  const lower = Math.max(0.044 * sds * ie, 0.01);
  const nearFault = s1 >= 0.6 ? (0.5 * s1) / reduction : null;
  const values: Record<CsEquation, number | null> = {
    '12.8-2': base,
    '12.8-3': t <= tl ? upper : null,
    '12.8-4': t > tl ? upper : null,
    '12.8-5': lower,
    '12.8-6': nearFault,
  };
  let cs = base;
  let governs: CsEquation = '12.8-2';
  if (upper < cs) {
    cs = upper;
    governs = t <= tl ? '12.8-3' : '12.8-4';
  }
  if (lower > cs) {
    cs = lower;
    governs = '12.8-5';
  }
  if (nearFault !== null && nearFault > cs) {
    cs = nearFault;
    governs = '12.8-6';
  }
  return { cs, governs, values };
}

/** Ta = Ct hn^x (12.8.2.1, Eq. 12.8-8), s; hn in m with the SI values of Ct (Table 12.8-2). */
export function approximatePeriod(ct: number, x: number, hn: number): number {
  return ct * hn ** x;
}

/** Table 12.8-1 (from memory): Cu against SD1, linear between the rows. */
const CU_TABLE: [number, number][] = [
  [0.1, 1.7],
  [0.15, 1.6],
  [0.2, 1.5],
  [0.3, 1.4],
  [0.4, 1.4],
];

export function upperLimitCoefficient(sd1: number): number {
  if (sd1 <= CU_TABLE[0][0]) return CU_TABLE[0][1];
  for (let i = 1; i < CU_TABLE.length; i += 1) {
    const [s0, c0] = CU_TABLE[i - 1];
    const [s1, c1] = CU_TABLE[i];
    if (sd1 <= s1) return c0 + ((sd1 - s0) / (s1 - s0)) * (c1 - c0);
  }
  return CU_TABLE[CU_TABLE.length - 1][1];
}

/** The period for ELF: the computed one, not more than Cu Ta (12.8.2). */
export function elfPeriod(
  computed: number,
  ta: number,
  cu: number,
): { period: number; capped: boolean } {
  const cap = cu * ta;
  return computed > cap ? { period: cap, capped: true } : { period: computed, capped: false };
}

/** k = 1 for T <= 0.5 s, 2 for T >= 2.5 s, linear between (12.8.3). */
export function distributionExponent(period: number): number {
  if (period <= 0.5) return 1;
  if (period >= 2.5) return 2;
  return 1 + (period - 0.5) / 2;
}

/** Fx = Cvx V, Cvx = wx hx^k / sum wi hi^k (12.8-11, 12.8-12); hx above the base. */
export function verticalDistribution(
  weights: readonly number[],
  elevations: readonly number[],
  baseShear: number,
  k: number,
): number[] {
  const terms = weights.map((w, i) => w * elevations[i] ** k);
  const sum = terms.reduce((a, b) => a + b, 0);
  return terms.map((t) => (baseShear * t) / sum);
}

/**
 * 12.9.1.4.1: where the combined modal base shear Vt is below the ELF base shear V, the forces
 * are scaled by V / Vt; otherwise not at all.
 */
export function modalScaleFactor(elfBaseShear: number, modalBaseShear: number): number {
  return modalBaseShear < elfBaseShear ? elfBaseShear / modalBaseShear : 1;
}
