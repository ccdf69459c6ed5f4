import type { UserDto } from '@tiermode/shared-types';
import { initialValues, toCreateRequest, toUpdateRequest, userFormSchema } from './user-form';

const reviewer: UserDto = {
  id: 'u1',
  email: 'r@firm.test',
  name: 'R',
  role: 'reviewer',
  active: true,
  licenseNumber: 'SE-1',
  licenseJurisdiction: 'Invented State',
  licenseExpiresOn: '2030-01-01',
  licensed: true,
  createdAt: '2026-01-01T00:00:00.000Z',
  updatedAt: '2026-01-01T00:00:00.000Z',
  version: 3,
};

describe('user form', () => {
  it('requires a first password of at least 10 characters for a new person', async () => {
    const schema = userFormSchema(true);
    const values = { ...initialValues(), email: 'a@b.test', name: 'A', password: 'short' };
    await expect(schema.validate(values)).rejects.toThrow('Use at least 10 characters');
    await expect(schema.validate({ ...values, password: '' })).rejects.toThrow(
      'Enter a first password',
    );
  });

  it('lets an edit leave the password blank', async () => {
    await expect(userFormSchema(false).validate(initialValues(reviewer))).resolves.toBeTruthy();
  });

  it('refuses a password over 72 bytes', async () => {
    const values = { ...initialValues(), email: 'a@b.test', name: 'A', password: 'é'.repeat(40) };
    await expect(userFormSchema(true).validate(values)).rejects.toThrow(/at most 72 bytes/);
  });

  it('sends licence fields only for reviewers', () => {
    const values = {
      ...initialValues(),
      email: ' a@b.test ',
      name: 'A',
      role: 'designer' as const,
      password: 'long-enough-1',
      licenseNumber: 'X',
    };
    expect(toCreateRequest(values)).toEqual({
      email: 'a@b.test',
      name: 'A',
      role: 'designer',
      password: 'long-enough-1',
    });
  });

  it('sends only the changed fields and the version read', () => {
    const values = { ...initialValues(reviewer), name: 'R. Hale', licenseExpiresOn: '2031-06-30' };
    expect(toUpdateRequest(reviewer, values)).toEqual({
      version: 3,
      name: 'R. Hale',
      licenseExpiresOn: '2031-06-30',
    });
  });

  it('clears the licence when a reviewer becomes a designer', () => {
    const values = { ...initialValues(reviewer), role: 'designer' as const };
    expect(toUpdateRequest(reviewer, values)).toEqual({
      version: 3,
      role: 'designer',
      licenseNumber: null,
      licenseJurisdiction: null,
      licenseExpiresOn: null,
    });
  });
});
