import { isLicensed, type LicenceHolder } from './licence';

const reviewer: LicenceHolder = {
  role: 'reviewer',
  licenseNumber: 'SE-1',
  licenseJurisdiction: 'Invented State',
  licenseExpiresOn: '2026-12-01',
};
const on = (iso: string) => new Date(`${iso}T12:00:00Z`);

describe('isLicensed', () => {
  it('holds through the expiry day and not after (API contract: expiry not in the past)', () => {
    expect(isLicensed(reviewer, on('2026-11-30'))).toBe(true);
    expect(isLicensed(reviewer, on('2026-12-01'))).toBe(true);
    expect(isLicensed(reviewer, on('2026-12-02'))).toBe(false);
  });

  it('needs all three licence fields', () => {
    expect(isLicensed({ ...reviewer, licenseNumber: null }, on('2026-01-01'))).toBe(false);
    expect(isLicensed({ ...reviewer, licenseNumber: '  ' }, on('2026-01-01'))).toBe(false);
    expect(isLicensed({ ...reviewer, licenseJurisdiction: null }, on('2026-01-01'))).toBe(false);
    expect(isLicensed({ ...reviewer, licenseExpiresOn: null }, on('2026-01-01'))).toBe(false);
  });

  it('is false for any role but reviewer, whatever the licence fields', () => {
    expect(isLicensed({ ...reviewer, role: 'admin' }, on('2026-01-01'))).toBe(false);
    expect(isLicensed({ ...reviewer, role: 'designer' }, on('2026-01-01'))).toBe(false);
  });
});
