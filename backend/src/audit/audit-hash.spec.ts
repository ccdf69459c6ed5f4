import { auditHash, firstBrokenEvent, GENESIS_HASH, type AuditContent } from './audit-hash';

function chain(n: number): (AuditContent & { hash: string })[] {
  const events: (AuditContent & { hash: string })[] = [];
  let previousHash = GENESIS_HASH;
  for (let seq = 1; seq <= n; seq += 1) {
    const content: AuditContent = {
      seq,
      calculationId: 'c1',
      actorId: 'u1',
      actorName: 'A',
      action: 'analysed',
      detail: { n: seq },
      at: `2026-12-01T00:00:0${seq}.000Z`,
      previousHash,
    };
    const hash = auditHash(content);
    events.push({ ...content, hash });
    previousHash = hash;
  }
  return events;
}

describe('the audit hash chain', () => {
  it('verifies an untouched chain', () => {
    expect(firstBrokenEvent(chain(5))).toBeNull();
    expect(firstBrokenEvent([])).toBeNull();
  });

  it('finds a changed event', () => {
    const events = chain(5);
    events[2] = { ...events[2], detail: { n: 99 } };
    expect(firstBrokenEvent(events)).toBe(3);
  });

  it('finds a removed event by its broken link', () => {
    const events = chain(5);
    events.splice(1, 1);
    expect(firstBrokenEvent(events)).toBe(3);
  });

  it('finds an event rewritten with a fresh hash, since the next link no longer holds', () => {
    const events = chain(4);
    const { hash: _old, ...content } = { ...events[1], actorName: 'Someone else' };
    void _old;
    events[1] = { ...content, hash: auditHash(content) };
    expect(firstBrokenEvent(events)).toBe(3);
  });
});
