import { buildAbility } from '@/lib/ability';
import { navigationFor } from './navigation';

const labels = (rules: Parameters<typeof buildAbility>[0]) =>
  navigationFor(buildAbility(rules)).map((e) => e.label);

describe('navigationFor', () => {
  it('shows People only to those who may manage users', () => {
    expect(labels([{ action: 'manage', subject: 'User' }])).toEqual(['Start', 'People']);
    expect(labels([{ action: 'read', subject: 'User', conditions: { id: 'me' } }])).toEqual([
      'Start',
    ]);
  });
});
