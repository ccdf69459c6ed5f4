import type { AbilityRule } from '@tiermode/shared-types';
import { buildAbility } from './ability';

describe('buildAbility', () => {
  it('allows what the rules allow and nothing else', () => {
    const rules: AbilityRule[] = [
      { action: 'manage', subject: 'User' },
      { action: 'read', subject: 'Outbox' },
    ];
    const ability = buildAbility(rules);
    expect(ability.can('create', 'User')).toBe(true);
    expect(ability.can('read', 'Outbox')).toBe(true);
    expect(ability.can('lock', 'Calculation')).toBe(false);
  });

  it('allows nothing with no rules', () => {
    expect(buildAbility([]).can('read', 'User')).toBe(false);
  });
});
