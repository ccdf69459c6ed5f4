import type { DecimalMark, Delimiter } from './number-format';
/**
 * `POST /api/analysis` (any signed-in user). SI base units throughout: kg, N/m, m, s, N, N*m;
 * spectral accelerations in g. Arrays are per storey; index 0 = storey 1 / level 1 (at the base).
 */
export interface StoreyInput {
  /** The engineer's name for the level, e.g. "Level 3" or "Roof"; kept with a saved calc. */
  label?: string;
  /** kg */
  mass: number;
  /** N/m */
  stiffness: number;
  /** m */
  height: number;
}

export interface SpectrumPointInput {
  /** s */
  period: number;
  /** g */
  sa: number;
}

export type SpectrumInterpolation = 'linear' | 'log-log';

export interface SpectrumInput {
  points: SpectrumPointInput[];
  interpolation?: SpectrumInterpolation;
  /**
   * Where the table came from: a generator and its parameters (as `/api/spectra/generate`
   * returns it), or `user` for a typed or uploaded table. Absent means `user`. Where a generated
   * table still matches its generator, periods past its end take the code's own long-period
   * branch instead of the last value.
   */
  source?: SpectrumSource;
}

export const ANALYSIS_LIMITS = {
  minStoreys: 1,
  maxStoreys: 500,
  minSpectrumPoints: 2,
  maxSpectrumPoints: 1000,
} as const;

/**
 * Bounds on the design spectrum generators' parameters. They keep each table within the
 * analysis's point limit (and the work bounded) and refuse values no site has: mapped TL reaches
 * 16 s (ASCE 7-22 Figures 22-14 to 22-17, from memory), ag and SDS stay well under 10 g.
 */
export const SPECTRUM_GENERATOR_LIMITS = {
  /** Last period of a generated table, s. */
  maxPeriod: 100,
  /** ASCE 7 long-period transition TL, s. */
  tl: 50,
  /** SDS, SD1 and agR, g. */
  acceleration: 10,
  importanceFactor: 5,
  q: 20,
  beta: 1,
  dampingPercent: 100,
} as const;

export interface AnalysisRequest {
  storeys: StoreyInput[];
  spectrum: SpectrumInput;
  /** 0 < zeta < 1, the same for every mode */
  dampingRatio: number;
  /** Use the first n modes; default all. */
  modeCount?: number;
  /** Use the fewest modes whose cumulative effective mass ratio reaches this (0 < r <= 1). */
  targetMassRatio?: number;
}

/** One mode's maxima. Signed: they carry the sign of `shape` (roof moving positive, as a rule). */
export interface ModalResponse {
  /** m, per level */
  displacement: number[];
  /** m, per storey: u_i - u_{i-1} */
  drift: number[];
  /** N, per level */
  floorForce: number[];
  /** N, per storey */
  storeyShear: number[];
  /** N*m, at the base of each storey */
  overturningMoment: number[];
  /** N */
  baseShear: number;
}

export interface ModeResult {
  number: number;
  /** s */
  period: number;
  /** Hz */
  frequency: number;
  /** rad/s */
  circularFrequency: number;
  /**
   * +1 at the roof; or, where the roof barely moves in this mode (its component is below 1e-6 of
   * the largest), +1 at the largest component: see `shapeNormalisation`.
   */
  shape: number[];
  /**
   * 'roof' or 'largest' (then `normalisationLevel` is the level where the shape is +1). Absent
   * from analyses stored before it existed, whose shapes are all roof-normalised.
   */
  shapeNormalisation?: 'roof' | 'largest';
  /** 1-based level where `shape` is +1. */
  normalisationLevel?: number;
  /** For `shape` as normalised. */
  participationFactor: number;
  /** kg */
  effectiveMass: number;
  effectiveMassRatio: number;
  cumulativeMassRatio: number;
  /** g, at this mode's period */
  sa: number;
  response: ModalResponse;
}

/** Combined maxima; all values non-negative. */
export interface CombinedResponse {
  displacement: number[];
  drift: number[];
  /** drift / storey height */
  driftRatio: number[];
  floorForce: number[];
  storeyShear: number[];
  overturningMoment: number[];
  baseShear: number;
  baseMoment: number;
}

export interface AnalysisResponse {
  /** kg */
  totalMass: number;
  /** The modes used, fundamental first. */
  modes: ModeResult[];
  /** How many modes the building has (N); `modes` may hold fewer. */
  availableModes: number;
  combined: { srss: CombinedResponse; cqc: CombinedResponse; abs: CombinedResponse };
  /** rho_ij of the modes used. */
  correlation: number[][];
  warnings: string[];
  /**
   * Results no building could have (a units slip, usually), each with the storey that causes
   * it. Absent from analyses stored before these flags existed.
   */
  plausibility?: PlausibilityFlag[];
  engineVersion: string;
}

/** A result past what any real building shows, and the storey to look at (1-based). */
export interface PlausibilityFlag {
  storey: number;
  message: string;
}

/** One checked value of a reference case. */
export interface VerificationRow {
  quantity: string;
  expected: number;
  computed: number;
  /** |computed - expected| / |expected| (absolute where expected is 0) */
  difference: number;
  tolerance: number;
  pass: boolean;
}

/** `GET /api/verification`: a published reference case and what the running engine gives now. */
export interface VerificationCaseResult {
  id: string;
  title: string;
  /** The published source of the expected values, or "common practice" / "from memory". */
  source: string;
  inputs: string[];
  rows: VerificationRow[];
  pass: boolean;
  engineVersion: string;
}

/** `POST /api/spectra/generate`: a design spectrum as an editable point table. */
export type SpectrumGeneratorKind = 'asce7-two-period' | 'en1998-elastic' | 'en1998-design';
export type GroundType = 'A' | 'B' | 'C' | 'D' | 'E';

export interface SpectrumGenerateRequest {
  kind: SpectrumGeneratorKind;
  /** ASCE 7: SDS, SD1 (g) and TL (s). */
  sds?: number;
  sd1?: number;
  tl?: number;
  /**
   * ASCE 7: the mapped S1 (g), optional. It does not shape the spectrum; it is recorded with the
   * source so that the code basis takes it (Eq. 12.8-6 applies where S1 >= 0.6 g).
   */
  s1?: number;
  /** EN 1998-1: agR (g), gamma_I, ground type, spectrum type 1 or 2. */
  agR?: number;
  importanceFactor?: number;
  groundType?: GroundType;
  spectrumType?: 1 | 2;
  /** EN 1998-1 elastic: viscous damping in percent (default 5). */
  dampingPercent?: number;
  /** EN 1998-1 design: behaviour factor q and lower-bound factor beta (default 0.2). */
  q?: number;
  beta?: number;
  /** Last period of the table, s. */
  maxPeriod?: number;
}

export interface SpectrumGenerateResponse {
  points: SpectrumPointInput[];
  interpolation: SpectrumInterpolation;
  /** The clause the table follows, as the software reads it. */
  basis: string;
  /** The generator and the parameters given, to store with the table. */
  source: SpectrumSource;
}

/** A generator's parameters: the generate request without its `kind`. */
export type SpectrumGeneratorParameters = Omit<SpectrumGenerateRequest, 'kind'>;

/** `inputs.spectrum.source`. */
export type SpectrumSource =
  { kind: 'user' } | { kind: SpectrumGeneratorKind; parameters: SpectrumGeneratorParameters };

/** `POST /api/analysis/column-stiffness`: a storey's lateral stiffness from its columns. */
export type ColumnFixity = 'fixed-fixed' | 'fixed-pinned';

export interface ColumnGroupInput {
  /** Young's modulus E, Pa */
  elasticModulus: number;
  /** Second moment of area I about the bending axis, m^4 */
  secondMoment: number;
  /** How many such columns */
  count: number;
  /** Both ends fixed against rotation (c = 12) or one end pinned (c = 3). */
  fixity: ColumnFixity;
}

export interface ColumnStiffnessRequest {
  /** Storey height h, m */
  height: number;
  columns: ColumnGroupInput[];
}

export interface ColumnStiffnessResponse {
  /** k = sum of c E I / h^3, N/m */
  stiffness: number;
  /** Each group's share, N/m, in the order given. */
  contributions: number[];
}

/**
 * One storey of an uploaded table, in SI base units (`POST /api/imports/storeys`); a cell that
 * could not be read is null, and `errors` says why, so the row can be fixed in the grid.
 */
export interface ImportedStorey {
  label: string;
  /** m */
  height: number | null;
  /** kg */
  mass: number | null;
  /** N/m */
  stiffness: number | null;
}

/** A problem in an uploaded table: the spreadsheet row (the header is row 1) and column. */
export interface ImportCellError {
  row: number;
  column: string;
  message: string;
}

/**
 * How an uploaded table was read: the CSV column separator (null for a workbook) and the
 * decimal mark, as asked for (the upload's `decimal` field) or as its cells settle it (null:
 * none did, and cells that read two ways were refused as ambiguous).
 */
export interface ImportReadAs {
  delimiter: Delimiter | null;
  decimal: DecimalMark | null;
}

/** `POST /api/imports/storeys`: the storeys read and every problem found. */
export interface StoreyImportResponse {
  storeys: ImportedStorey[];
  errors: ImportCellError[];
  readAs: ImportReadAs;
}

/** `POST /api/imports/spectrum`: the points read and every problem found. */
export interface SpectrumImportResponse {
  points: SpectrumPointInput[];
  errors: ImportCellError[];
  readAs: ImportReadAs;
}

/**
 * What a shown shape and participation factor are normalised to, where it is not the roof:
 * "shape +1 at level 3"; empty for the usual roof normalisation.
 */
export function shapeNormalisationNote(
  mode: Pick<ModeResult, 'shapeNormalisation' | 'normalisationLevel'>,
): string {
  return mode.shapeNormalisation === 'largest'
    ? `shape +1 at level ${mode.normalisationLevel}`
    : '';
}
