/**
 * Whether two JSON values are equal, whatever the order of their keys (the server may return
 * an object's keys in another order than the client wrote them). Written here because the
 * well-known deep-equal packages also compare key order or class identity, which is not wanted.
 */
export function sameJson(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (Array.isArray(a) || Array.isArray(b)) {
    return (
      Array.isArray(a) &&
      Array.isArray(b) &&
      a.length === b.length &&
      a.every((item, i) => sameJson(item, b[i]))
    );
  }
  if (a && b && typeof a === 'object' && typeof b === 'object') {
    const keysA = Object.keys(a).filter((k) => (a as Record<string, unknown>)[k] !== undefined);
    const keysB = Object.keys(b).filter((k) => (b as Record<string, unknown>)[k] !== undefined);
    return (
      keysA.length === keysB.length &&
      keysA.every((k) =>
        sameJson((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]),
      )
    );
  }
  return false;
}
