import { REFERENCE_CASES, type ReferenceCase } from './reference-cases';
import { evaluateCase } from './verification.service';

describe('the reference cases shown on the Verification page', () => {
  it.each(REFERENCE_CASES.map((c) => [c.id, c] as const))('%s passes', (_, reference) => {
    const result = evaluateCase(reference);
    for (const row of result.rows) {
      expect({ quantity: row.quantity, pass: row.pass, difference: row.difference }).toEqual({
        quantity: row.quantity,
        pass: true,
        difference: row.difference,
      });
    }
    expect(result.pass).toBe(true);
    expect(result.source.length).toBeGreaterThan(20);
  });

  it('fails a case whose expected value is wrong, so a pass means something', () => {
    const wrong: ReferenceCase = {
      ...REFERENCE_CASES[1],
      values: () =>
        REFERENCE_CASES[1].values().map((v) => ({ ...v, expected: v.expected * 1.001 })),
    };
    const result = evaluateCase(wrong);
    expect(result.pass).toBe(false);
    expect(result.rows.every((row) => !row.pass)).toBe(true);
  });
});
