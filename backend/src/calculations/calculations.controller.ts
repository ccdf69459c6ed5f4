import { Body, Controller, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import type {
  AnalysisResponse,
  AuditEventDto,
  CalculationDto,
  SealCheckResponse,
} from '@tiermode/shared-types';
import type { AppAbility } from '../authorization/app-ability';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { CurrentAbility, CurrentUser } from '../authorization/current.decorators';
import { UuidParam } from '../common/pipes/uuid-param.pipe';
import type { User } from '../users/user.entity';
import { CalculationsService } from './calculations.service';
import { CreateCalculationDto, UpdateCalculationDto } from './dto/calculation.dto';
import { CreateCommentDto, UpdateCommentDto } from './dto/comment.dto';
import { LockCalculationDto, ReturnCalculationDto } from './dto/review.dto';

@Controller()
export class CalculationsController {
  constructor(private readonly calculations: CalculationsService) {}

  @Get('projects/:id/calculations')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  list(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) projectId: string,
  ): Promise<CalculationDto[]> {
    return this.calculations.listForProject(ability, projectId);
  }

  @Post('projects/:id/calculations')
  @CheckPolicies((ability) => ability.can('create', 'Calculation'))
  create(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) projectId: string,
    @Body() body: CreateCalculationDto,
  ): Promise<CalculationDto> {
    return this.calculations.create(ability, user, projectId, body);
  }

  @Get('calculations/:id')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  get(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<CalculationDto> {
    return this.calculations.get(ability, id);
  }

  @Patch('calculations/:id')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  update(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) id: string,
    @Body() body: UpdateCalculationDto,
  ): Promise<CalculationDto> {
    return this.calculations.update(ability, user, id, body);
  }

  @Post('calculations/:id/analyse')
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  analyse(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<AnalysisResponse> {
    return this.calculations.analyse(ability, user, id);
  }

  @Post('calculations/:id/submit')
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('submit', 'Calculation'))
  submit(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<CalculationDto> {
    return this.calculations.submit(ability, user, id);
  }

  @Post('calculations/:id/return')
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('return', 'Calculation'))
  returnToDesigner(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) id: string,
    @Body() body: ReturnCalculationDto,
  ): Promise<CalculationDto> {
    return this.calculations.returnToDesigner(ability, user, id, body.comment);
  }

  @Post('calculations/:id/lock')
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('lock', 'Calculation'))
  lock(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) id: string,
    @Body() body: LockCalculationDto,
  ): Promise<CalculationDto> {
    return this.calculations.lock(ability, user, id, body.statement);
  }

  @Post('calculations/:id/revise')
  @CheckPolicies((ability) => ability.can('revise', 'Calculation'))
  revise(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<CalculationDto> {
    return this.calculations.revise(ability, user, id);
  }

  @Get('calculations/:id/seal')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  seal(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<SealCheckResponse> {
    return this.calculations.checkSeal(ability, id);
  }

  @Get('calculations/:id/history')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  history(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<AuditEventDto[]> {
    return this.calculations.history(ability, id);
  }

  @Post('calculations/:id/comments')
  @CheckPolicies((ability) => ability.can('comment', 'Calculation'))
  comment(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) id: string,
    @Body() body: CreateCommentDto,
  ): Promise<CalculationDto> {
    return this.calculations.addComment(ability, user, id, body.body, body.target ?? null);
  }

  @Patch('comments/:id')
  @CheckPolicies((ability) => ability.can('update', 'ReviewComment'))
  resolveComment(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) id: string,
    @Body() body: UpdateCommentDto,
  ): Promise<CalculationDto> {
    return this.calculations.resolveComment(ability, user, id, body.resolved);
  }
}
