/**
 * Array.isArray narrows a readonly array to any[], which would switch off type checking of what
 * follows; this guard keeps the element type.
 */
export function isArray(value: unknown): value is readonly unknown[] {
  return Array.isArray(value);
}
