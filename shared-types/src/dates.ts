/**
 * The one way the product writes a moment: "2026-12-03 14:05 UTC", on every screen, in the
 * calc package and in mail. UTC, so a sealed record reads the same in every office.
 */
export function formatDateTime(iso: string | null | undefined, missing: string = '—'): string {
  if (!iso) return missing;
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return missing;
  return `${date.toISOString().replace('T', ' ').slice(0, 16)} UTC`;
}

/** A day, as "2026-12-03" (ISO 8601), for dates without a time (licence expiry, lists). */
export function formatDate(iso: string | null | undefined, missing: string = '—'): string {
  if (!iso) return missing;
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return missing;
  return date.toISOString().slice(0, 10);
}
