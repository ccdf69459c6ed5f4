import type { CodeBasisParameters } from '@tiermode/shared-types';
import * as yup from 'yup';
import { fromDisplay, toDisplay, unitLabel, type UnitSystem } from '@/lib/units';

/** The form's values: every field as typed text, the code choosing which are used. */
export interface BasisFormValues {
  code: CodeBasisParameters['code'];
  [field: string]: string;
}

export interface BasisField {
  name: string;
  label: string;
  clause: string;
  /** 0 allowed (S1), or strictly positive. */
  zero?: boolean;
  max?: number;
  options?: string[];
}

export const FIELDS: Record<CodeBasisParameters['code'], BasisField[]> = {
  'ASCE7-22': [
    { name: 'sds', label: 'SDS (g)', clause: '11.4.5' },
    { name: 'sd1', label: 'SD1 (g)', clause: '11.4.5' },
    { name: 's1', label: 'S1 (g)', clause: '11.4.2; 12.8-6 when >= 0.6', zero: true },
    { name: 'tl', label: 'TL (s)', clause: '11.4.6' },
    { name: 'r', label: 'R', clause: 'Table 12.2-1' },
    { name: 'cd', label: 'Cd', clause: 'Table 12.2-1' },
    { name: 'ie', label: 'Ie', clause: 'Table 1.5-2' },
    {
      name: 'omega0',
      label: 'Omega0',
      clause: 'Table 12.2-1 (recorded; not used by these checks)',
    },
    { name: 'ct', label: 'Ct', clause: 'Table 12.8-2' },
    { name: 'x', label: 'x', clause: 'Table 12.8-2' },
    {
      name: 'riskCategory',
      label: 'Risk category',
      clause: 'Table 1.5-1; drift limit Table 12.12-1',
      options: ['I', 'II', 'III', 'IV'],
    },
  ],
  'EN1998-1': [
    { name: 'ag', label: 'ag (g)', clause: '3.2.1' },
    {
      name: 'groundType',
      label: 'Ground type',
      clause: 'Table 3.1',
      options: ['A', 'B', 'C', 'D', 'E'],
    },
    { name: 'spectrumType', label: 'Spectrum type', clause: '3.2.2.2', options: ['1', '2'] },
    { name: 'importanceFactor', label: 'Importance factor', clause: '4.2.5' },
    { name: 'q', label: 'Behaviour factor q', clause: '3.2.2.5' },
    { name: 'nu', label: 'nu', clause: '4.4.3.2(2)', max: 1 },
    {
      name: 'driftLimitClass',
      label: 'Non-structural elements',
      clause: '4.4.3.2(1) a, b, c',
      options: ['brittle', 'ductile', 'none'],
    },
  ],
  USER: [
    { name: 'scaleFactor', label: 'Scale factor', clause: 'user-defined' },
    { name: 'driftLimitRatio', label: 'Drift limit (drift / height)', clause: 'user-defined' },
    { name: 'deflectionAmplification', label: 'Deflection amplification', clause: 'user-defined' },
    { name: 'stabilityLimit', label: 'Stability limit (theta)', clause: 'user-defined' },
  ],
};

export function basisSchema(code: CodeBasisParameters['code']) {
  const shape: Record<string, yup.Schema> = {};
  for (const field of FIELDS[code]) {
    if (field.options) {
      shape[field.name] = yup
        .string()
        .oneOf(field.options, `Choose one of ${field.options.join(', ')}`)
        .required(`${field.label} is needed`);
      continue;
    }
    let number = yup
      .number()
      .transform((value: number, original: string) =>
        String(original).trim() === '' ? undefined : value,
      )
      .typeError(`${field.label} must be a number`)
      .required(`${field.label} is needed`);
    number = field.zero
      ? number.min(0, `${field.label} must be 0 or more`)
      : number.positive(`${field.label} must be more than 0`);
    if (field.max !== undefined)
      number = number.max(field.max, `${field.label} must be at most ${field.max}`);
    shape[field.name] = number;
  }
  return yup.object(shape);
}

/**
 * The optional per-level list of each basis: its field, and how a value shows in the chosen
 * units (ASCE 7 weights as forces; EN 1998-1 masses as masses, which US units show as weights).
 */
export const PER_LEVEL = {
  'ASCE7-22': { name: 'seismicWeights', quantity: 'force' },
  'EN1998-1': { name: 'seismicMasses', quantity: 'mass' },
} as const;

/** The per-level list's label in the chosen units. */
export function perLevelLabel(code: 'ASCE7-22' | 'EN1998-1', units: UnitSystem): string {
  return code === 'ASCE7-22'
    ? `Seismic weight per level (${unitLabel(units, 'force')})`
    : units === 'US'
      ? `Seismic weight per level (${unitLabel(units, 'mass')})`
      : `Seismic mass per level (${unitLabel(units, 'mass')})`;
}

/** 1 ft = 0.3048 m exactly (international foot). */
const FOOT = 0.3048;

/**
 * Ct as the chosen units give it: Ta = Ct hn^x with hn in m (SI) or ft (US), so
 * Ct(US) = Ct(SI) x 0.3048^x (ASCE 7-22 Table 12.8-2 gives both; common practice).
 */
export function ctToDisplay(units: UnitSystem, ctSi: number, x: number): number {
  return units === 'US' ? ctSi * FOOT ** x : ctSi;
}

export function ctFromDisplay(units: UnitSystem, shown: number, x: number): number {
  return units === 'US' ? shown / FOOT ** x : shown;
}

/** A field's label in the chosen units (Ct names the unit of hn it takes). */
export function fieldLabel(field: BasisField, units: UnitSystem): string {
  return field.name === 'ct' ? `Ct (hn in ${unitLabel(units, 'length')})` : field.label;
}

/** "1200, 1150, 980" as numbers, or null when blank; throws a message naming the problem. */
export function perLevel(text: string, storeys: number): number[] | null {
  if (text.trim() === '') return null;
  const values = text
    .split(/[,;\s]+/)
    .filter(Boolean)
    .map(Number);
  if (values.some((v) => !(v > 0) || !Number.isFinite(v))) {
    throw new Error('Every value must be a positive number');
  }
  if (values.length !== storeys) throw new Error(`Give one value per storey (${storeys})`);
  return values;
}

/** The typed values, in the chosen units, as the API takes them (SI). */
export function toBasis(
  values: BasisFormValues,
  storeys: number,
  units: UnitSystem = 'SI',
): CodeBasisParameters {
  const out: Record<string, unknown> = { code: values.code };
  const list = values.code === 'USER' ? null : PER_LEVEL[values.code];
  if (list) {
    const parsed = perLevel(values[list.name] ?? '', storeys);
    if (parsed) out[list.name] = parsed.map((v) => fromDisplay(units, list.quantity, v));
  }
  for (const field of FIELDS[values.code]) {
    const text = values[field.name];
    out[field.name] = field.options && field.name !== 'spectrumType' ? text : Number(text);
  }
  if (values.code === 'ASCE7-22') {
    out.ct = ctFromDisplay(units, Number(values.ct), Number(values.x));
  }
  return out as unknown as CodeBasisParameters;
}

export function fromBasis(
  basis: CodeBasisParameters | null,
  code: CodeBasisParameters['code'],
  units: UnitSystem = 'SI',
): BasisFormValues {
  const values: BasisFormValues = { code };
  const source =
    basis && basis.code === code ? (basis as unknown as Record<string, unknown>) : DEFAULTS[code];
  for (const field of FIELDS[code]) {
    const value = source[field.name];
    values[field.name] =
      typeof value === 'number' || typeof value === 'string' ? String(value) : '';
  }
  if (code !== 'USER') {
    const list = PER_LEVEL[code];
    const given = source[list.name];
    values[list.name] = Array.isArray(given)
      ? given
          .map((v) => Number(toDisplay(units, list.quantity, Number(v)).toPrecision(8)))
          .join(', ')
      : '';
  }
  if (code === 'ASCE7-22') {
    const ct = Number(source.ct);
    const x = Number(source.x);
    values.ct = String(Number(ctToDisplay(units, ct, x).toPrecision(6)));
  }
  return values;
}

/** Starting values of an invented site, for the engineer to replace with the project's own. */
const DEFAULTS: Record<CodeBasisParameters['code'], Record<string, unknown>> = {
  'ASCE7-22': {
    sds: 1.0,
    sd1: 0.6,
    s1: 0.6,
    tl: 8,
    r: 8,
    cd: 5.5,
    ie: 1,
    omega0: 3,
    ct: 0.0466,
    x: 0.9,
    riskCategory: 'II',
  },
  'EN1998-1': {
    ag: 0.25,
    groundType: 'C',
    spectrumType: 1,
    importanceFactor: 1,
    q: 3.9,
    nu: 0.5,
    driftLimitClass: 'ductile',
  },
  USER: { scaleFactor: 1, driftLimitRatio: 0.02, deflectionAmplification: 1, stabilityLimit: 0.25 },
};

/**
 * Ct and x of the approximate period by structural system, ASCE 7-22 Table 12.8-2 in SI units
 * (from memory; check against the edition).
 */
export const PERIOD_SYSTEMS: { label: string; ct: number; x: number }[] = [
  { label: 'Steel moment-resisting frames', ct: 0.0724, x: 0.8 },
  { label: 'Concrete moment-resisting frames', ct: 0.0466, x: 0.9 },
  { label: 'Steel eccentrically or buckling-restrained braced frames', ct: 0.0731, x: 0.75 },
  { label: 'All other structural systems', ct: 0.0488, x: 0.75 },
];
