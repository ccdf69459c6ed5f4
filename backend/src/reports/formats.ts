import {
  formatDateTime,
  toDisplay,
  unitLabel,
  type Quantity,
  type UnitSystem,
} from '@tiermode/shared-types';

const grouped = (digits: number) =>
  new Intl.NumberFormat('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** Decimals of each quantity in each unit system: mm to 0.01, in to 0.001, kN and kip to 0.1. */
const DECIMALS: Record<UnitSystem, Record<Quantity, number>> = {
  SI: {
    length: 2,
    mass: 1,
    stiffness: 0,
    force: 1,
    moment: 1,
    displacement: 2,
    modulus: 1,
    secondMoment: 0,
  },
  US: {
    length: 2,
    mass: 1,
    stiffness: 1,
    force: 1,
    moment: 1,
    displacement: 3,
    modulus: 0,
    secondMoment: 1,
  },
};

/** An SI value in the package's units, grouped, with its quantity's decimals. */
export const inUnits = (units: UnitSystem, quantity: Quantity, si: number) =>
  grouped(DECIMALS[units][quantity]).format(toDisplay(units, quantity, si));

/** "Storey shear (kip)": a heading with the unit of the package's system. */
export const withUnit = (units: UnitSystem, title: string, quantity: Quantity) =>
  `${title} (${unitLabel(units, quantity)})`;

/** How the calc package writes numbers; the tests read them back with the same rules. */
export const formats = {
  period: (s: number) => s.toFixed(4),
  ratio: (r: number) => r.toFixed(5),
  percent: (fraction: number) => (fraction * 100).toFixed(2),
  kN: (newtons: number) => inUnits('SI', 'force', newtons),
  kNm: (newtonMetres: number) => inUnits('SI', 'moment', newtonMetres),
  t: (kg: number) => inUnits('SI', 'mass', kg),
  kNperM: (nPerM: number) => inUnits('SI', 'stiffness', nPerM),
  mm: (m: number) => inUnits('SI', 'displacement', m),
  m: (m: number) => inUnits('SI', 'length', m),
  g: (sa: number) => sa.toFixed(4),
  plain: (x: number) => x.toPrecision(4),
};

/** The product's one date-and-time format (shared with the screens). */
export const isoDate = (iso: string | null) => formatDateTime(iso, '-');
