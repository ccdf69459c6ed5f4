import { Forbidden } from '@/components/errors/forbidden';
import { UsersPage } from '@/features/users/components/users-page';
import { useAppAbility } from '@/lib/ability';

export function UsersRoute() {
  const ability = useAppAbility();
  return ability.can('manage', 'User') ? <UsersPage /> : <Forbidden />;
}
