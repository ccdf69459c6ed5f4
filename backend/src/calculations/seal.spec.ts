import { createHash } from 'node:crypto';
import { sealHash, type SealedContent } from './seal';

const content = (): SealedContent => ({
  inputs: {
    storeys: [{ mass: 1, stiffness: 2, height: 3 }],
    spectrum: {
      points: [
        { period: 0, sa: 1 },
        { period: 1, sa: 1 },
      ],
    },
    dampingRatio: 0.05,
  },
  analysis: { totalMass: 1 } as SealedContent['analysis'],
  engineVersion: '1.0.0',
  reviewerName: 'R',
  licenseNumber: 'SE-1',
  licenseJurisdiction: 'Invented',
  statement: 'Accepted',
  lockedAt: '2026-12-01T00:00:00.000Z',
});

describe('sealHash (SHA-256 over RFC 8785 canonical JSON)', () => {
  it('does not depend on the order of keys', () => {
    const a = content();
    const b = JSON.parse(
      JSON.stringify({ ...a, statement: a.statement, engineVersion: a.engineVersion }),
    ) as SealedContent;
    const reordered = Object.fromEntries(Object.entries(b).reverse()) as unknown as SealedContent;
    expect(sealHash(reordered)).toBe(sealHash(a));
    expect(sealHash(a)).toMatch(/^[0-9a-f]{64}$/);
  });

  it('changes when any sealed value changes', () => {
    const base = sealHash(content());
    const changed = content();
    changed.inputs.storeys[0].mass = 1.0000001;
    expect(sealHash(changed)).not.toBe(base);
    expect(sealHash({ ...content(), statement: 'Accepted.' })).not.toBe(base);
  });

  it('hashes the canonical text, written out by hand here', () => {
    // The canonical JSON of {"b":1,"a":"x"} is {"a":"x","b":1} (RFC 8785 3.2.3: keys sorted).
    const hash = sealHash({ b: 1, a: 'x' } as unknown as SealedContent);
    expect(hash).toBe(createHash('sha256').update('{"a":"x","b":1}').digest('hex'));
  });
});
