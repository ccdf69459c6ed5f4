import { formatDateTime } from '@tiermode/shared-types';

const grouped = (digits: number) =>
  new Intl.NumberFormat('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** How the calc package writes numbers; the tests read them back with the same rules. */
export const formats = {
  period: (s: number) => s.toFixed(4),
  ratio: (r: number) => r.toFixed(5),
  percent: (fraction: number) => (fraction * 100).toFixed(2),
  kN: (newtons: number) => grouped(1).format(newtons / 1000),
  kNm: (newtonMetres: number) => grouped(1).format(newtonMetres / 1000),
  t: (kg: number) => grouped(1).format(kg / 1000),
  kNperM: (nPerM: number) => grouped(0).format(nPerM / 1000),
  mm: (m: number) => (m * 1000).toFixed(2),
  m: (m: number) => m.toFixed(2),
  g: (sa: number) => sa.toFixed(4),
  plain: (x: number) => x.toPrecision(4),
};

/** The product's one date-and-time format (shared with the screens). */
export const isoDate = (iso: string | null) => formatDateTime(iso, '-');
