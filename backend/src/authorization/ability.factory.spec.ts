import { subject } from '@casl/ability';
import type { Role } from '@tiermode/shared-types';
import type { User } from '../users/user.entity';
import { AbilityFactory } from './ability.factory';

const today = new Date('2026-12-01T12:00:00Z');

function user(role: Role, licence: Partial<User> = {}): User {
  return {
    id: `${role}-1`,
    role,
    licenseNumber: null,
    licenseJurisdiction: null,
    licenseExpiresOn: null,
    ...licence,
  } as User;
}

const licensed = {
  licenseNumber: 'SE-1',
  licenseJurisdiction: 'Invented State',
  licenseExpiresOn: '2027-06-30',
};

describe('AbilityFactory', () => {
  const factory = new AbilityFactory();

  it('lets only the admin manage people and read the outbox', () => {
    const roles: Role[] = ['admin', 'designer', 'reviewer', 'student'];
    const allowed = roles.filter((r) =>
      factory.createForUser(user(r), today).can('manage', 'User'),
    );
    expect(allowed).toEqual(['admin']);
    expect(factory.createForUser(user('admin'), today).can('read', 'Outbox')).toBe(true);
    expect(factory.createForUser(user('designer'), today).can('read', 'Outbox')).toBe(false);
  });

  it('lets every user read its own account and no one else’s (unless admin)', () => {
    const designer = factory.createForUser(user('designer'), today);
    expect(designer.can('read', subject('User', user('designer')))).toBe(true);
    expect(designer.can('read', subject('User', user('student')))).toBe(false);
  });

  it('does not let an admin deactivate or demote itself, but lets it edit others', () => {
    const admin = user('admin');
    const ability = factory.createForUser(admin, today);
    expect(ability.can('update', subject('User', admin), 'active')).toBe(false);
    expect(ability.can('update', subject('User', admin), 'role')).toBe(false);
    expect(ability.can('update', subject('User', admin), 'name')).toBe(true);
    expect(ability.can('update', subject('User', user('designer')), 'active')).toBe(true);
  });

  it('lets a reviewer lock only while licensed, and never a calc it wrote', () => {
    const unlicensed = factory.createForUser(user('reviewer'), today);
    expect(unlicensed.can('lock', 'Calculation')).toBe(false);
    const reviewer = user('reviewer', licensed);
    const ability = factory.createForUser(reviewer, today);
    expect(ability.can('lock', 'Calculation')).toBe(true);
    const own = { authorId: reviewer.id, status: 'submitted' };
    const others = { authorId: 'designer-1', status: 'submitted' };
    expect(ability.can('lock', subject('Calculation', own) as never)).toBe(false);
    expect(ability.can('lock', subject('Calculation', others) as never)).toBe(true);
    const lapsed = factory.createForUser(reviewer, new Date('2027-07-01T00:00:00Z'));
    expect(lapsed.can('lock', 'Calculation')).toBe(false);
  });

  it('lets a designer edit only projects it is a member of', () => {
    const designer = factory.createForUser(user('designer'), today);
    expect(
      designer.can('update', subject('Project', { id: 'p1', memberIds: ['designer-1'] })),
    ).toBe(true);
    expect(designer.can('update', subject('Project', { id: 'p2', memberIds: ['someone'] }))).toBe(
      false,
    );
    expect(designer.can('read', subject('Project', { id: 'p2', memberIds: ['someone'] }))).toBe(
      true,
    );
    expect(factory.createForUser(user('student'), today).can('read', 'Project')).toBe(false);
  });

  it('lets a student read only locked and superseded calcs', () => {
    const student = factory.createForUser(user('student'), today);
    const calc = (status: string) => subject('Calculation', { status }) as never;
    expect(student.can('read', calc('locked'))).toBe(true);
    expect(student.can('read', calc('superseded'))).toBe(true);
    expect(student.can('read', calc('draft'))).toBe(false);
    expect(student.can('read', calc('submitted'))).toBe(false);
  });
});
