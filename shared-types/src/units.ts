import { createUnit, unit } from 'mathjs';

/**
 * Display units, one table for the screens, the exports and the calc package. Values are SI base
 * units in the API and the database (kg, N/m, m, N, N*m); the screens and files show them in the engineer's working units, converted with mathjs units.
 * In US customary units the storey mass is entered and shown as seismic weight in kip
 * (mass = W / g), as US practice does.
 */
export type UnitSystem = 'SI' | 'US';
export type Quantity =
  | 'length'
  | 'mass'
  | 'stiffness'
  | 'force'
  | 'moment'
  | 'displacement'
  | 'modulus'
  | 'secondMoment';

// mathjs rounds the kip to 4448.2216 N; the international pound-force is exactly
// 4.4482216152605 N (0.45359237 kg x 9.80665 m/s^2).
createUnit('kip', '4448.2216152605 N', { override: true });
createUnit('ksi', '1000 psi', { override: true });

/** Standard gravity, m/s^2 (CGPM 1901): weight <-> mass, and the unit g of accelerations. */
export const STANDARD_GRAVITY = 9.80665;
const G = STANDARD_GRAVITY;

interface UnitSpec {
  /** mathjs unit of the displayed value */
  unit: string;
  /** label shown in headers and on axes */
  label: string;
  /** the displayed value is a weight standing for the mass */
  weight?: boolean;
}

const UNITS: Record<UnitSystem, Record<Quantity, UnitSpec>> = {
  SI: {
    length: { unit: 'm', label: 'm' },
    mass: { unit: 't', label: 't' },
    stiffness: { unit: 'kN/m', label: 'kN/m' },
    force: { unit: 'kN', label: 'kN' },
    moment: { unit: 'kN m', label: 'kN·m' },
    displacement: { unit: 'mm', label: 'mm' },
    // Steel section tables give I in cm^4.
    modulus: { unit: 'GPa', label: 'GPa' },
    secondMoment: { unit: 'cm^4', label: 'cm⁴' },
  },
  US: {
    length: { unit: 'ft', label: 'ft' },
    mass: { unit: 'kip', label: 'kip', weight: true },
    stiffness: { unit: 'kip/in', label: 'kip/in' },
    force: { unit: 'kip', label: 'kip' },
    moment: { unit: 'kip ft', label: 'kip·ft' },
    displacement: { unit: 'in', label: 'in' },
    modulus: { unit: 'ksi', label: 'ksi' },
    secondMoment: { unit: 'in^4', label: 'in⁴' },
  },
};

const SI_BASE: Record<Quantity, string> = {
  length: 'm',
  mass: 'kg',
  stiffness: 'N/m',
  force: 'N',
  moment: 'N m',
  displacement: 'm',
  modulus: 'Pa',
  secondMoment: 'm^4',
};

/** The label of a quantity's display unit, for column headers and axes. */
export function unitLabel(system: UnitSystem, quantity: Quantity): string {
  return UNITS[system][quantity].label;
}

/** The name of the mass column: mass in SI, seismic weight in US units. */
export function massHeader(system: UnitSystem): string {
  return UNITS[system].mass.weight
    ? `Seismic weight (${unitLabel(system, 'mass')})`
    : `Mass (${unitLabel(system, 'mass')})`;
}

/** SI base value -> displayed value. */
export function toDisplay(system: UnitSystem, quantity: Quantity, si: number): number {
  const spec = UNITS[system][quantity];
  if (spec.weight) return unit(si * G, 'N').toNumber(spec.unit);
  return unit(si, SI_BASE[quantity]).toNumber(spec.unit);
}

/** Displayed value -> SI base value. */
export function fromDisplay(system: UnitSystem, quantity: Quantity, shown: number): number {
  const spec = UNITS[system][quantity];
  if (spec.weight) return unit(shown, spec.unit).toNumber('N') / G;
  return unit(shown, spec.unit).toNumber(SI_BASE[quantity]);
}

/** A number for a table cell: four significant figures, no exponent for everyday sizes. */
export function formatNumber(value: number, digits: number = 4): string {
  if (!Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-3 && magnitude < 1e7) {
    return Number(value.toPrecision(digits)).toLocaleString('en-US', { maximumFractionDigits: 6 });
  }
  return value.toExponential(digits - 1);
}
