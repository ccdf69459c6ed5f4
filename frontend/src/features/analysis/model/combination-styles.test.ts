import { describe, expect, it } from 'vitest';
import { COMBINATION_STYLES } from './combination-styles';

const style = (key: string) => COMBINATION_STYLES.find((s) => s.key === key)!;

describe('the combinations on the response plots', () => {
  it('draws SRSS over CQC, narrower and dashed, so both show where they agree', () => {
    // chart.js draws a higher order first, underneath.
    expect(style('srss').order).toBeLessThan(style('cqc').order);
    expect(style('srss').width).toBeLessThan(style('cqc').width);
    expect(style('srss').dash.length).toBeGreaterThan(0);
    expect(style('cqc').dash).toEqual([]);
  });

  it('gives each combination its own colour and line, and names ABS an upper bound', () => {
    expect(new Set(COMBINATION_STYLES.map((s) => s.colour)).size).toBe(3);
    expect(new Set(COMBINATION_STYLES.map((s) => s.dash.join(','))).size).toBe(3);
    expect(style('abs').label).toBe('ABS (upper bound)');
  });
});
