import type { AnalysisResponse, CalculationInputs } from '@tiermode/shared-types';

export interface Table {
  name: string;
  headers: string[];
  rows: (string | number | null)[][];
}

// Results are exported in the SI units the screens use: t, kN, kN*m, mm.
const T = 1e-3;
const KN = 1e-3;
const MM = 1e3;

const labelOf = (inputs: CalculationInputs, i: number) => inputs.storeys[i]?.label ?? '';

/**
 * The stored results as three tables: the modes, each mode's responses storey by storey, and
 * the combined responses (SRSS, CQC, ABS) with the base shear and moment.
 */
export function resultTables(inputs: CalculationInputs, analysis: AnalysisResponse): Table[] {
  const modes: Table = {
    name: 'Modes',
    headers: [
      'Mode',
      'Period (s)',
      'Frequency (Hz)',
      'Circular frequency (rad/s)',
      'Participation factor (shape +1 at the level in the last column)',
      'Effective modal mass (t)',
      'Effective mass ratio (%)',
      'Cumulative mass ratio (%)',
      'Sa (g)',
      'Shape +1 at level',
    ],
    rows: analysis.modes.map((m) => [
      m.number,
      m.period,
      m.frequency,
      m.circularFrequency,
      m.participationFactor,
      m.effectiveMass * T,
      m.effectiveMassRatio * 100,
      m.cumulativeMassRatio * 100,
      m.sa,
      // The roof unless the roof barely moves in this mode (analyses before engine 1.1: roof).
      m.normalisationLevel ?? inputs.storeys.length,
    ]),
  };
  const storeyHeaders = [
    'Storey',
    'Label',
    'Displacement (mm)',
    'Drift (mm)',
    'Floor force (kN)',
    'Storey shear (kN)',
    'Overturning moment (kN*m)',
  ];
  const modal: Table = {
    name: 'Modal responses',
    headers: ['Mode', ...storeyHeaders],
    rows: analysis.modes.flatMap((m) =>
      m.response.displacement.map((u, i) => [
        m.number,
        i + 1,
        labelOf(inputs, i),
        u * MM,
        m.response.drift[i] * MM,
        m.response.floorForce[i] * KN,
        m.response.storeyShear[i] * KN,
        m.response.overturningMoment[i] * KN,
      ]),
    ),
  };
  const methods = [
    ['SRSS', analysis.combined.srss],
    ['CQC', analysis.combined.cqc],
    ['ABS', analysis.combined.abs],
  ] as const;
  const combined: Table = {
    name: 'Combined responses',
    headers: ['Combination', ...storeyHeaders, 'Drift ratio'],
    rows: methods.flatMap(([method, r]) => [
      ...r.displacement.map((u, i) => [
        method,
        i + 1,
        labelOf(inputs, i),
        u * MM,
        r.drift[i] * MM,
        r.floorForce[i] * KN,
        r.storeyShear[i] * KN,
        r.overturningMoment[i] * KN,
        r.driftRatio[i],
      ]),
      [method, 'Base', '', null, null, null, r.baseShear * KN, r.baseMoment * KN, null],
    ]),
  };
  return [modes, modal, combined];
}
