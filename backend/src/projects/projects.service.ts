import { ForbiddenError, subject } from '@casl/ability';
import { EntityManager, LockMode, OptimisticLockError } from '@mikro-orm/knex';
import {
  BadRequestException,
  ConflictException,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import type { ProjectDto, ProjectMemberDto } from '@tiermode/shared-types';
import type { AppAbility } from '../authorization/app-ability';
import { User } from '../users/user.entity';
import type { CreateProjectDto, UpdateProjectDto } from './dto/project.dto';
import { Calculation } from '../calculations/calculation.entity';
import { Project } from './project.entity';
import { projectSubject, toProjectDto } from './project.mapper';

@Injectable()
export class ProjectsService {
  constructor(private readonly em: EntityManager) {}

  async list(ability: AppAbility): Promise<ProjectDto[]> {
    ForbiddenError.from(ability).throwUnlessCan('read', 'Project');
    const projects = await this.em.find(
      Project,
      {},
      { populate: ['members'], orderBy: { name: 'asc' } },
    );
    return projects
      .filter((p) => ability.can('read', subject('Project', projectSubject(p))))
      .map(toProjectDto);
  }

  async get(ability: AppAbility, id: string): Promise<ProjectDto> {
    const project = await this.load(id);
    ForbiddenError.from(ability).throwUnlessCan(
      'read',
      subject('Project', projectSubject(project)),
    );
    return toProjectDto(project);
  }

  /** Active designers by name, the people a project's members may add. */
  async designers(): Promise<ProjectMemberDto[]> {
    const users = await this.em.find(
      User,
      { role: 'designer', active: true },
      { orderBy: { name: 'asc' } },
    );
    return users.map((u) => ({ id: u.id, name: u.name }));
  }

  async create(ability: AppAbility, author: User, body: CreateProjectDto): Promise<ProjectDto> {
    ForbiddenError.from(ability).throwUnlessCan('create', 'Project');
    const project = this.em.create(Project, {
      name: body.name,
      site: body.site ?? null,
      codeBasis: body.codeBasis ?? 'USER',
      structuralSystem: body.structuralSystem || null,
      createdBy: author,
    });
    project.members.add(author);
    await this.em.flush();
    return toProjectDto(project);
  }

  async update(
    ability: AppAbility,
    caller: User,
    id: string,
    body: UpdateProjectDto,
  ): Promise<ProjectDto> {
    const project = await this.load(id);
    ForbiddenError.from(ability).throwUnlessCan(
      'update',
      subject('Project', projectSubject(project)),
    );
    if (body.version !== undefined) await this.checkVersion(project, body.version);
    if (body.name !== undefined) project.name = body.name;
    if (body.site !== undefined) project.site = body.site || null;
    if (body.codeBasis !== undefined) project.codeBasis = body.codeBasis;
    if (body.structuralSystem !== undefined) {
      project.structuralSystem = body.structuralSystem || null;
    }
    if (body.memberIds !== undefined) {
      const ids = [...new Set(body.memberIds)];
      if (!ids.includes(caller.id)) {
        throw new BadRequestException(['memberIds must include you: you cannot remove yourself']);
      }
      const users = await this.em.find(User, { id: { $in: ids } });
      const missing = ids.filter((uid) => !users.some((u) => u.id === uid));
      if (missing.length > 0)
        throw new BadRequestException([`memberIds: no user with id ${missing[0]}`]);
      const notDesigner = users.find((u) => u.role !== 'designer' || !u.active);
      if (notDesigner) {
        throw new BadRequestException([`memberIds: ${notDesigner.name} is not an active designer`]);
      }
      project.members.set(users);
    }
    await this.em.flush();
    return toProjectDto(project);
  }

  async remove(ability: AppAbility, id: string): Promise<void> {
    const project = await this.load(id);
    ForbiddenError.from(ability).throwUnlessCan(
      'delete',
      subject('Project', projectSubject(project)),
    );
    // Checked first for a message that says why; the foreign key refuses it at the same time
    // (answered 409 too), so a calc created meanwhile is never orphaned.
    const calculations = await this.em.count(Calculation, { project });
    if (calculations > 0) {
      throw new ConflictException(
        `This project holds ${calculations} calculation${calculations === 1 ? '' : 's'}, so it cannot be deleted; calcs are kept for the record`,
      );
    }
    await this.em.remove(project).flush();
  }

  private async load(id: string): Promise<Project> {
    const project = await this.em.findOne(Project, { id }, { populate: ['members'] });
    if (!project) throw new NotFoundException(`No project with id ${id}`);
    return project;
  }

  private async checkVersion(project: Project, version: number): Promise<void> {
    try {
      await this.em.lock(project, LockMode.OPTIMISTIC, version);
    } catch (error) {
      if (error instanceof OptimisticLockError) {
        throw new ConflictException(
          `This project was changed by someone else (version ${project.version}, yours ${version}); reload and try again`,
        );
      }
      throw error;
    }
  }
}
