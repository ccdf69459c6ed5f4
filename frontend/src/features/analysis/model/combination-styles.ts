/**
 * How each combination is drawn on the response plots. CQC and SRSS often agree to the pixel:
 * CQC goes underneath, wide and solid, and SRSS over it, narrow and dashed, so each stays
 * visible where they coincide; ABS is long-dashed. In chart.js a dataset with a higher `order`
 * is drawn earlier, under the others (by default the first dataset would cover the rest).
 */
export const COMBINATION_STYLES = [
  { key: 'cqc', label: 'CQC', dash: [] as number[], width: 5, colour: 1, order: 2 },
  { key: 'srss', label: 'SRSS', dash: [5, 5] as number[], width: 2, colour: 0, order: 1 },
  {
    key: 'abs',
    label: 'ABS (upper bound)',
    dash: [12, 4] as number[],
    width: 2,
    colour: 2,
    order: 0,
  },
] as const;
