import { Forbidden } from '@/components/errors/forbidden';
import { ProjectsPage } from '@/features/projects/components/projects-page';
import { useAppAbility } from '@/lib/ability';

export function ProjectsRoute() {
  const ability = useAppAbility();
  return ability.can('read', 'Project') ? <ProjectsPage /> : <Forbidden />;
}
