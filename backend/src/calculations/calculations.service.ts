import { ForbiddenError, subject } from '@casl/ability';
import { EntityManager, LockMode, OptimisticLockError } from '@mikro-orm/sqlite';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import type {
  AnalysisRequest,
  AnalysisResponse,
  CalculationDto,
  CalculationInputs,
} from '@tiermode/shared-types';
import { AnalysisService } from '../analysis/analysis.service';
import { accessibleWhere } from '../authorization/accessible-where';
import type { AppAbility } from '../authorization/app-ability';
import { Project } from '../projects/project.entity';
import { projectSubject } from '../projects/project.mapper';
import type { User } from '../users/user.entity';
import { Calculation } from './calculation.entity';
import { calculationSubject, toCalculationDto } from './calculation.mapper';
import type { CreateCalculationDto, UpdateCalculationDto } from './dto/calculation.dto';

const POPULATE = ['project.members', 'author'] as const;

/** The inputs as plain JSON, whatever class instances validation made of them. */
function plainInputs(inputs: AnalysisRequest): CalculationInputs {
  return JSON.parse(JSON.stringify(inputs)) as CalculationInputs;
}

@Injectable()
export class CalculationsService {
  constructor(
    private readonly em: EntityManager,
    private readonly analysis: AnalysisService,
  ) {}

  async listForProject(ability: AppAbility, projectId: string): Promise<CalculationDto[]> {
    const project = await this.em.findOne(Project, { id: projectId }, { populate: ['members'] });
    if (!project) throw new NotFoundException(`No project with id ${projectId}`);
    ForbiddenError.from(ability).throwUnlessCan(
      'read',
      subject('Project', projectSubject(project)),
    );
    const where = accessibleWhere(ability, 'read', 'Calculation');
    if (where === null) return [];
    const calcs = await this.em.find(
      Calculation,
      { $and: [{ project }, where] },
      { populate: POPULATE, orderBy: { title: 'asc', revision: 'desc' } },
    );
    return calcs
      .filter((c) => ability.can('read', subject('Calculation', calculationSubject(c))))
      .map(toCalculationDto);
  }

  async create(
    ability: AppAbility,
    author: User,
    projectId: string,
    body: CreateCalculationDto,
  ): Promise<CalculationDto> {
    const project = await this.em.findOne(Project, { id: projectId }, { populate: ['members'] });
    if (!project) throw new NotFoundException(`No project with id ${projectId}`);
    ForbiddenError.from(ability).throwUnlessCan(
      'create',
      subject('Calculation', {
        id: '',
        status: 'draft',
        authorId: author.id,
        projectMemberIds: projectSubject(project).memberIds,
      }),
    );
    const inputs = plainInputs(body.inputs);
    this.analysis.validate(inputs, 'inputs.');
    const calc = this.em.create(Calculation, { project, title: body.title, inputs, author });
    await this.em.flush();
    return toCalculationDto(calc);
  }

  async get(ability: AppAbility, id: string): Promise<CalculationDto> {
    const calc = await this.load(id);
    ForbiddenError.from(ability).throwUnlessCan(
      'read',
      subject('Calculation', calculationSubject(calc)),
    );
    return toCalculationDto(calc);
  }

  async update(
    ability: AppAbility,
    id: string,
    body: UpdateCalculationDto,
  ): Promise<CalculationDto> {
    const calc = await this.loadForWrite(ability, id, 'update');
    try {
      await this.em.lock(calc, LockMode.OPTIMISTIC, body.version);
    } catch (error) {
      if (error instanceof OptimisticLockError) {
        throw new ConflictException(
          `This calculation was changed by someone else (version ${calc.version}, yours ${body.version}); reload and try again`,
        );
      }
      throw error;
    }
    if (body.title !== undefined) calc.title = body.title;
    if (body.inputs !== undefined) {
      const inputs = plainInputs(body.inputs);
      this.analysis.validate(inputs, 'inputs.');
      calc.inputs = inputs;
      calc.inputsChangedAt = new Date();
    }
    await this.em.flush();
    return toCalculationDto(calc);
  }

  /** Runs the engine on the stored inputs and keeps the result with the engine version. */
  async analyse(ability: AppAbility, id: string): Promise<AnalysisResponse> {
    const calc = await this.loadForWrite(ability, id, 'analyse');
    const result = this.analysis.analyse(calc.inputs);
    calc.analysis = result;
    calc.engineVersion = result.engineVersion;
    calc.analysedAt = new Date();
    await this.em.flush();
    return result;
  }

  private async load(id: string): Promise<Calculation> {
    const calc = await this.em.findOne(Calculation, { id }, { populate: POPULATE });
    if (!calc) throw new NotFoundException(`No calculation with id ${id}`);
    return calc;
  }

  /**
   * A calculation about to be changed: one that is locked or superseded accepts no change (409),
   * one under review accepts none until it is returned (409); otherwise the ability decides.
   */
  private async loadForWrite(
    ability: AppAbility,
    id: string,
    action: 'update' | 'analyse',
  ): Promise<Calculation> {
    const calc = await this.load(id);
    ForbiddenError.from(ability).throwUnlessCan(
      'read',
      subject('Calculation', calculationSubject(calc)),
    );
    if (calc.status === 'locked' || calc.status === 'superseded') {
      throw new ConflictException(
        `This calculation is ${calc.status} and can never change; revise it to start a new draft`,
      );
    }
    if (calc.status === 'submitted') {
      throw new ConflictException(
        'This calculation is submitted for review; it can change again once the reviewer returns it',
      );
    }
    ForbiddenError.from(ability).throwUnlessCan(
      action,
      subject('Calculation', calculationSubject(calc)),
    );
    return calc;
  }
}
