import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import type { ProjectDto, ProjectMemberDto } from '@tiermode/shared-types';
import type { AppAbility } from '../authorization/app-ability';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { CurrentAbility, CurrentUser } from '../authorization/current.decorators';
import { UuidParam } from '../common/pipes/uuid-param.pipe';
import type { User } from '../users/user.entity';
import { CreateProjectDto, UpdateProjectDto } from './dto/project.dto';
import { ProjectsService } from './projects.service';
import { ApiContract } from '../openapi/api-contract.decorator';

@Controller('projects')
export class ProjectsController {
  constructor(private readonly projects: ProjectsService) {}

  @ApiContract({ summary: 'Projects the caller may see', returns: 'ProjectDto[]' })
  @Get()
  @CheckPolicies((ability) => ability.can('read', 'Project'))
  list(@CurrentAbility() ability: AppAbility): Promise<ProjectDto[]> {
    return this.projects.list(ability);
  }

  @ApiContract({ summary: 'Create a project', body: 'CreateProjectRequest', returns: 'ProjectDto' })
  @Post()
  @CheckPolicies((ability) => ability.can('create', 'Project'))
  create(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Body() body: CreateProjectDto,
  ): Promise<ProjectDto> {
    return this.projects.create(ability, user, body);
  }

  /** The active designers, who may be made members (before `:id`, which it would match). */
  @ApiContract({
    summary: 'Designers who may be made project members',
    returns: 'ProjectMemberDto[]',
  })
  @Get('designers')
  @CheckPolicies((ability) => ability.can('create', 'Project'))
  designers(): Promise<ProjectMemberDto[]> {
    return this.projects.designers();
  }

  @ApiContract({ summary: 'One project', returns: 'ProjectDto' })
  @Get(':id')
  @CheckPolicies((ability) => ability.can('read', 'Project'))
  get(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<ProjectDto> {
    return this.projects.get(ability, id);
  }

  @ApiContract({
    summary: 'Change a project (optimistic lock on version)',
    body: 'UpdateProjectRequest',
    returns: 'ProjectDto',
  })
  @Patch(':id')
  @CheckPolicies((ability) => ability.can('update', 'Project'))
  update(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) id: string,
    @Body() body: UpdateProjectDto,
  ): Promise<ProjectDto> {
    return this.projects.update(ability, user, id, body);
  }

  @ApiContract({ summary: 'Delete a project that has no calcs of record', returns: null })
  @Delete(':id')
  @HttpCode(204)
  @CheckPolicies((ability) => ability.can('delete', 'Project'))
  remove(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<void> {
    return this.projects.remove(ability, id);
  }
}
