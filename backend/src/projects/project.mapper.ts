import type { ProjectDto } from '@tiermode/shared-types';
import type { ProjectRecord } from '../authorization/app-ability';
import type { Project } from './project.entity';

/** The project as responses show it; its members must be loaded. */
export function toProjectDto(project: Project): ProjectDto {
  const members = project.members
    .getItems()
    .map((u) => ({ id: u.id, name: u.name }))
    .sort((a, b) => a.name.localeCompare(b.name));
  return {
    id: project.id,
    name: project.name,
    site: project.site,
    codeBasis: project.codeBasis,
    structuralSystem: project.structuralSystem,
    members,
    memberIds: members.map((m) => m.id),
    createdAt: project.createdAt.toISOString(),
    updatedAt: project.updatedAt.toISOString(),
    version: project.version,
  };
}

/** The plain record CASL's conditions are checked against. */
export function projectSubject(project: Project): ProjectRecord {
  return { id: project.id, memberIds: project.members.getItems().map((u) => u.id) };
}
