import { Forbidden } from '@/components/errors/forbidden';
import { OutboxPage } from '@/features/mail/components/outbox-page';
import { useAppAbility } from '@/lib/ability';

export function OutboxRoute() {
  const ability = useAppAbility();
  return ability.can('read', 'Outbox') ? <OutboxPage /> : <Forbidden />;
}
