import type {
  SpectrumGeneratorKind,
  SpectrumGeneratorParameters,
  SpectrumSource,
} from './analysis';
import type { CodeBasisParameters } from './checks';

/** Each generator as the screens and the calc package name it, with its clause. */
export const SPECTRUM_GENERATOR_LABELS: Record<SpectrumGeneratorKind, string> = {
  'asce7-two-period': 'ASCE 7 two-period (11.4.6)',
  'en1998-elastic': 'EN 1998-1 elastic (3.2.2.2)',
  'en1998-design': 'EN 1998-1 design (3.2.2.5)',
};

/** A generator parameter's name and unit as people read it. */
export const SPECTRUM_PARAMETER_LABELS: Record<
  keyof SpectrumGeneratorParameters,
  { label: string; unit: string }
> = {
  sds: { label: 'SDS', unit: 'g' },
  sd1: { label: 'SD1', unit: 'g' },
  s1: { label: 'S1', unit: 'g' },
  tl: { label: 'TL', unit: 's' },
  agR: { label: 'agR', unit: 'g' },
  importanceFactor: { label: 'γI', unit: '' },
  groundType: { label: 'ground type', unit: '' },
  spectrumType: { label: 'spectrum type', unit: '' },
  dampingPercent: { label: 'damping ξ', unit: '%' },
  q: { label: 'q', unit: '' },
  beta: { label: 'β', unit: '' },
  maxPeriod: { label: 'table to', unit: 's' },
};

/**
 * Where a spectrum came from, in one line: "ASCE 7 two-period (11.4.6): SDS 1 g, SD1 0.6 g,
 * TL 8 s", or "a typed or uploaded table" (also for spectra stored before sources existed).
 */
export function describeSpectrumSource(source: SpectrumSource | undefined): string {
  if (!source || source.kind === 'user') return 'a typed or uploaded table';
  const parameters = Object.entries(source.parameters)
    .filter(([, value]) => value !== undefined && value !== null)
    .map(([name, value]) => {
      const about = SPECTRUM_PARAMETER_LABELS[name as keyof SpectrumGeneratorParameters];
      if (!about) return `${name} ${show(value)}`;
      return `${about.label} ${show(value)}${about.unit ? ` ${about.unit}` : ''}`;
    });
  return `${SPECTRUM_GENERATOR_LABELS[source.kind]}: ${parameters.join(', ')}`;
}

/** The code basis each generator belongs to. */
const BASIS_OF: Record<SpectrumGeneratorKind, CodeBasisParameters['code']> = {
  'asce7-two-period': 'ASCE7-22',
  'en1998-elastic': 'EN1998-1',
  'en1998-design': 'EN1998-1',
};

type BasisValue = number | string;

/**
 * A parameter value as a person reads and types it: at most 10 significant digits, so
 * 1.2 x 0.25 reads 0.3, not 0.30000000000000004.
 */
export function readableValue(value: number | string): string {
  return typeof value === 'number' ? String(Number(value.toPrecision(10))) : value;
}

const show = (value: unknown) =>
  typeof value === 'number' || typeof value === 'string' ? readableValue(value) : String(value);

/** One basis field the spectrum fixes: its name in the basis, label, unit and value. */
export interface SpectrumBasisValue {
  field: string;
  label: string;
  unit: string;
  value: BasisValue;
}

/**
 * The code-basis values a generated spectrum fixes, for the basis of its own code: SDS, SD1,
 * TL (and S1 where it was recorded) for ASCE 7; ag = gamma_I agR (EN 1998-1 3.2.1(3)), gamma_I,
 * the ground and spectrum types and q for EN 1998-1. Empty for a typed table or another basis.
 * Generator defaults (gamma_I 1) are applied as the generator applies them.
 */
export function basisValuesFromSpectrum(
  source: SpectrumSource | undefined,
  code: CodeBasisParameters['code'],
): SpectrumBasisValue[] {
  if (!source || source.kind === 'user' || BASIS_OF[source.kind] !== code) return [];
  const p = source.parameters;
  const values: SpectrumBasisValue[] = [];
  const add = (field: string, label: string, unit: string, value: BasisValue | undefined) => {
    if (value !== undefined && value !== null) values.push({ field, label, unit, value });
  };
  if (source.kind === 'asce7-two-period') {
    add('sds', 'SDS', 'g', p.sds);
    add('sd1', 'SD1', 'g', p.sd1);
    add('s1', 'S1', 'g', p.s1);
    add('tl', 'TL', 's', p.tl);
    return values;
  }
  const importance = p.importanceFactor ?? 1;
  if (p.agR !== undefined) add('ag', 'ag', 'g', importance * p.agR);
  add('importanceFactor', 'importance factor', '', importance);
  add('groundType', 'ground type', '', p.groundType);
  add('spectrumType', 'spectrum type', '', p.spectrumType);
  if (source.kind === 'en1998-design') add('q', 'q', '', p.q);
  return values;
}

const same = (a: BasisValue, b: unknown) =>
  typeof a === 'number' && typeof b === 'number'
    ? Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b))
    : String(a) === String(b);

/**
 * Where the code basis and the design spectrum disagree, each in a sentence naming the value on
 * both sides: a generated spectrum of another code, a parameter that differs, or an EN 1998-1
 * elastic spectrum under the EN 1998-1 basis (which takes the design spectrum with q). Empty
 * when they agree, for a typed table, and for a user-defined basis.
 */
export function spectrumBasisMismatches(
  basis: CodeBasisParameters,
  source: SpectrumSource | undefined,
): string[] {
  if (!source || source.kind === 'user' || basis.code === 'USER') return [];
  if (BASIS_OF[source.kind] !== basis.code) {
    return [
      `The design spectrum was generated as ${SPECTRUM_GENERATOR_LABELS[source.kind]}, but the code basis is ${basis.code}: the checks would mix two codes. Generate the spectrum for the basis, or change the basis.`,
    ];
  }
  const messages = basisValuesFromSpectrum(source, basis.code)
    .filter(
      ({ field, value }) => !same(value, (basis as unknown as Record<string, unknown>)[field]),
    )
    .map(
      ({ field, label, unit, value }) =>
        `The code basis has ${label} ${show((basis as unknown as Record<string, unknown>)[field])}${unit ? ` ${unit}` : ''} but the design spectrum was generated with ${label} ${show(value)}${unit ? ` ${unit}` : ''}: the checks and the spectrum disagree. Take the spectrum's values into the basis, or generate the spectrum again.`,
    );
  if (source.kind === 'en1998-elastic' && basis.code === 'EN1998-1') {
    messages.push(
      `The design spectrum is the EN 1998-1 elastic spectrum (3.2.2.2), but the EN 1998-1 checks take the design spectrum with q (3.2.2.5): forces and design drifts would be about q = ${basis.q} times too large. Generate the design spectrum.`,
    );
  }
  return messages;
}
