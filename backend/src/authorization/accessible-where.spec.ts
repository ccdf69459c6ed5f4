import { AbilityBuilder, createMongoAbility } from '@casl/ability';
import type { AppAbility } from './app-ability';
import { accessibleWhere } from './accessible-where';

function abilityOf(define: (b: AbilityBuilder<AppAbility>) => void): AppAbility {
  const builder = new AbilityBuilder<AppAbility>(createMongoAbility);
  define(builder);
  return builder.build();
}

describe('accessibleWhere', () => {
  it('is null when no rule allows the action', () => {
    const ability = abilityOf(({ can }) => can('read', 'Project'));
    expect(accessibleWhere(ability, 'read', 'User')).toBeNull();
  });

  it('is an empty filter for unconditional access', () => {
    const ability = abilityOf(({ can }) => can('manage', 'User'));
    expect(accessibleWhere(ability, 'read', 'User')).toEqual({});
  });

  it('keeps the conditions of a conditional rule', () => {
    const ability = abilityOf(({ can }) => can('read', 'User', { id: 'u1' }));
    expect(accessibleWhere(ability, 'read', 'User')).toEqual({ id: 'u1' });
  });

  it('joins several grants with $or and bounds them by later refusals', () => {
    const ability = abilityOf(({ can, cannot }) => {
      can('read', 'Calculation', { status: 'locked' });
      can('read', 'Calculation', { authorId: 'me' });
      cannot('read', 'Calculation', { deleted: true });
    });
    expect(accessibleWhere(ability, 'read', 'Calculation')).toEqual({
      $or: [
        { $and: [{ authorId: 'me' }, { $not: { deleted: true } }] },
        { $and: [{ status: 'locked' }, { $not: { deleted: true } }] },
      ],
    });
  });
});
