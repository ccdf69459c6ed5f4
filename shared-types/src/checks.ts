import type { AnalysisRequest } from './analysis';

export const RISK_CATEGORIES = ['I', 'II', 'III', 'IV'] as const;
export type RiskCategoryCode = (typeof RISK_CATEGORIES)[number];
export const GROUND_TYPES = ['A', 'B', 'C', 'D', 'E'] as const;
export const DRIFT_LIMIT_CLASSES = ['brittle', 'ductile', 'none'] as const;

/** ASCE 7-22 parameters; the spectrum of the request is the design spectrum as published. */
export interface Asce7Basis {
  code: 'ASCE7-22';
  /** g */
  sds: number;
  sd1: number;
  s1: number;
  /** s */
  tl: number;
  r: number;
  cd: number;
  ie: number;
  omega0?: number;
  /** Ta = ct hn^x, SI values (Table 12.8-2). */
  ct: number;
  x: number;
  riskCategory: RiskCategoryCode;
  /** N per level, storey 1 first; default mass x g. */
  seismicWeights?: number[];
  /** m; default the total height. */
  hn?: number;
}

/** EN 1998-1:2004; the spectrum of the request is the design spectrum (with q). */
export interface En1998Basis {
  code: 'EN1998-1';
  /** g */
  ag: number;
  groundType: (typeof GROUND_TYPES)[number];
  spectrumType: 1 | 2;
  importanceFactor: number;
  q: number;
  /** The reduction factor nu of 4.4.3.2 (0.5 or 0.4 by importance class). */
  nu: number;
  driftLimitClass: (typeof DRIFT_LIMIT_CLASSES)[number];
  /** kg per level, storey 1 first; default the storey masses. */
  seismicMasses?: number[];
}

export interface UserBasis {
  code: 'USER';
  scaleFactor: number;
  /** Allowed storey drift over height. */
  driftLimitRatio: number;
  /** The analysis drifts are multiplied by this to give design drifts. */
  deflectionAmplification: number;
  /** The largest stability coefficient allowed. */
  stabilityLimit: number;
}

export type CodeBasisParameters = Asce7Basis | En1998Basis | UserBasis;

/** `POST /api/checks`. */
export interface ChecksRequest extends AnalysisRequest {
  basis: CodeBasisParameters;
  /** The combined values the checks use; default `cqc`. */
  combination?: 'cqc' | 'srss';
}

export interface StoreyCheck {
  storey: number;
  /** The design storey drift over the storey height. */
  designDriftRatio: number;
  driftLimitRatio: number;
  driftOk: boolean;
  theta: number;
  thetaMax: number;
  stabilityOk: boolean;
  pDelta: string;
  /** N: the ELF force at this storey's floor, V distributed with the k exponent (ASCE 7-22 12.8.3); null on other bases. */
  elfForce: number | null;
  /** N: the combined storey shear used by the checks, before and after scaling. */
  modalShear: number;
  scaledShear: number;
}

/**
 * The design storey values beside the analysis's combined ones (the combination the checks
 * use): forces x `forceFactor`, displacements and drifts x `displacementFactor`.
 */
export interface DesignStoreyValues {
  /**
   * What the analysis's own values are: `elastic` (ASCE 7 and a user basis: the spectrum as
   * published) or `design` (EN 1998-1: the design spectrum already includes q).
   */
  analysisValues: 'elastic' | 'design';
  /** The combined values the factors apply to. */
  combination: 'cqc' | 'srss';
  /** ASCE 7-22: scale / (R / Ie); EN 1998-1: 1; user: the scale factor. */
  forceFactor: number;
  /** ASCE 7-22: (Cd / Ie) / (R / Ie) x drift scale; EN 1998-1: q (4.3.4); user: its amplification. */
  displacementFactor: number;
  /** How the factors arise, with clauses. */
  explanation: string;
  /** N per level */
  floorForce: number[];
  /** N per storey */
  storeyShear: number[];
  /** N*m at the base of each storey */
  overturningMoment: number[];
  /** m per level */
  displacement: number[];
  /** m per storey */
  drift: number[];
}

export interface ChecksResponse {
  code: CodeBasisParameters['code'];
  elf: {
    /** s: the period used (capped at Cu Ta for ASCE 7-22). */
    period: number;
    computedPeriod: number;
    approximatePeriod: number | null;
    capped: boolean;
    cs: number;
    csGoverns: string | null;
    /** N */
    baseShear: number;
    /** N, total seismic weight */
    weight: number;
    clause: string;
  };
  /** N: the combined modal base shear as the checks use it (reduced for ASCE 7-22). */
  modalBaseShear: number;
  scaleFactor: number;
  /** 1 unless the code asks drifts to be scaled too. */
  driftScaleFactor: number;
  storeys: StoreyCheck[];
  irregularities: {
    type: string;
    storey: number;
    rule: string;
    message: string;
    clause: string;
    excepted: boolean;
    exceptionReason?: string;
  }[];
  /** Plain statements of what passed, failed or needs the engineer's attention, with clauses. */
  notes: string[];
  /**
   * Where the basis and the design spectrum disagree (a generated spectrum's SDS, ag, q... that
   * the basis does not share, or a spectrum of another code). Absent from checks stored before
   * this existed.
   */
  warnings?: string[];
  /** Absent from checks stored before it existed. */
  design?: DesignStoreyValues;
}
