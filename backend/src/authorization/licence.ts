/** The fields that make a reviewer licensed. */
export interface LicenceHolder {
  role: string;
  licenseNumber: string | null;
  licenseJurisdiction: string | null;
  licenseExpiresOn: string | null;
}

/**
 * A reviewer is licensed when it has a licence number, a jurisdiction and an expiry date that is
 * not in the past (the licence is current through its expiry day, compared in UTC).
 */
export function isLicensed(holder: LicenceHolder, today: Date = new Date()): boolean {
  if (holder.role !== 'reviewer') return false;
  if (!holder.licenseNumber?.trim() || !holder.licenseJurisdiction?.trim()) return false;
  if (!holder.licenseExpiresOn) return false;
  return holder.licenseExpiresOn >= today.toISOString().slice(0, 10);
}
