import {
  BadRequestException,
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  Param,
  Patch,
  Post,
  Query,
} from '@nestjs/common';
import type {
  AnalysisAnswer,
  AuditEventDto,
  CalculationAnswer,
  CalculationChanges,
  CalculationDto,
  ModalDetail,
  ResponseHistoryResult,
  SealCheckResponse,
} from '@tiermode/shared-types';
import { parseAnalysisDetail } from '../analysis/analysis-detail';
import { analysisAnswer } from '../analysis/analysis-work';
import type { AppAbility } from '../authorization/app-ability';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { CurrentAbility, CurrentUser } from '../authorization/current.decorators';
import { UuidParam } from '../common/pipes/uuid-param.pipe';
import type { User } from '../users/user.entity';
import { AttachmentsService } from './attachments.service';
import { CalculationsService } from './calculations.service';
import { CreateCalculationDto, UpdateCalculationDto } from './dto/calculation.dto';
import { CreateCommentDto, UpdateCommentDto } from './dto/comment.dto';
import { LockCalculationDto, ReturnCalculationDto } from './dto/review.dto';
import { ApiContract } from '../openapi/api-contract.decorator';
import { Expensive } from '../rate-limit/expensive.decorator';

@Controller()
export class CalculationsController {
  constructor(
    private readonly calculations: CalculationsService,
    private readonly attachments: AttachmentsService,
  ) {}

  @ApiContract({ summary: 'Calcs of a project', returns: 'CalculationDto[]' })
  @Get('projects/:id/calculations')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  list(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) projectId: string,
  ): Promise<CalculationDto[]> {
    return this.calculations.listForProject(ability, projectId);
  }

  @ApiContract({
    summary: 'Start a draft calc',
    body: 'CreateCalculationRequest',
    returns: 'CalculationDto',
  })
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

  @ApiContract({
    summary:
      'One calc, its stored analysis as a summary (detail=summary, the default) or whole (detail=full)',
    query: 'AnalysisDetailQuery',
    returns: 'CalculationAnswer',
  })
  @Get('calculations/:id')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  get(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
    @Query('detail') detail?: unknown,
  ): Promise<CalculationAnswer> {
    return parseAnalysisDetail(detail, 'summary') === 'full'
      ? this.calculations.getWhole(ability, id)
      : this.calculations.get(ability, id);
  }

  @ApiContract({
    summary: 'Edit a draft (optimistic lock on version)',
    body: 'UpdateCalculationRequest',
    returns: 'CalculationDto',
  })
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

  @ApiContract({
    summary: 'Analyse the stored inputs and keep the result (detail=full, the default, or summary)',
    query: 'AnalysisDetailQuery',
    returns: 'AnalysisAnswer',
  })
  @Post('calculations/:id/analyse')
  @Expensive()
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  async analyse(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) id: string,
    @Query('detail') detail?: unknown,
  ): Promise<AnalysisAnswer> {
    const wanted = parseAnalysisDetail(detail, 'full');
    return analysisAnswer(await this.calculations.analyse(ability, user, id), wanted);
  }

  @ApiContract({
    summary:
      "The stored analysis's per-mode storey responses and correlation matrix (what the calc's summary leaves out)",
    returns: 'ModalDetail',
  })
  @Get('calculations/:id/modal-responses')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  modalResponses(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<ModalDetail> {
    return this.calculations.modalDetail(ability, id);
  }

  @ApiContract({
    summary:
      "The calc's response history results: peaks, histories for display, the record's spectrum",
    returns: 'ResponseHistoryResult',
  })
  @Get('calculations/:id/history-results')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  historyResults(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<ResponseHistoryResult> {
    return this.calculations.historyResults(ability, id);
  }

  @ApiContract({ summary: 'Submit an analysed draft for review', returns: 'CalculationDto' })
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

  @ApiContract({
    summary: 'Return a submitted calc to its designers',
    body: 'ReturnCalculationRequest',
    returns: 'CalculationDto',
  })
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

  @ApiContract({
    summary: 'Lock and seal a submitted calc (licensed reviewer)',
    body: 'LockCalculationRequest',
    returns: 'CalculationDto',
  })
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

  @ApiContract({
    summary: 'Start a new revision of a locked calc as a draft',
    returns: 'CalculationDto',
  })
  @Post('calculations/:id/revise')
  @CheckPolicies((ability) => ability.can('revise', 'Calculation'))
  revise(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<CalculationDto> {
    return this.calculations.revise(ability, user, id);
  }

  @ApiContract({ summary: 'Recompute and check the seal', returns: 'SealCheckResponse' })
  @Get('calculations/:id/seal')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  seal(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<SealCheckResponse> {
    return this.calculations.checkSeal(ability, id);
  }

  @ApiContract({
    summary:
      'What changed since the last submission or the previous revision, storey by storey and field by field',
    returns: 'CalculationChanges',
  })
  @Get('calculations/:id/changes')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  changes(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
    @Query('since') since?: string,
  ): Promise<CalculationChanges> {
    if (since !== 'submission' && since !== 'revision') {
      throw new BadRequestException(['since must be one of submission, revision']);
    }
    return this.calculations.changes(ability, id, since);
  }

  @ApiContract({ summary: 'The audit events of a calc', returns: 'AuditEventDto[]' })
  @Get('calculations/:id/history')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  history(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<AuditEventDto[]> {
    return this.calculations.history(ability, id);
  }

  @ApiContract({
    summary: 'Add a review comment',
    body: 'CreateCommentRequest',
    returns: 'CalculationDto',
  })
  @Post('calculations/:id/comments')
  @CheckPolicies((ability) => ability.can('comment', 'Calculation'))
  comment(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) id: string,
    @Body() body: CreateCommentDto,
  ): Promise<CalculationDto> {
    return this.calculations.addComment(ability, user, id, body);
  }

  @ApiContract({
    summary: 'Resolve or reopen a review comment',
    body: 'UpdateCommentRequest',
    returns: 'CalculationDto',
  })
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

  /** Deletes a scratch draft (never submitted) with its attachments: its author only. */
  @ApiContract({
    summary: 'Delete a draft that was never submitted (its author only)',
    returns: null,
  })
  @Delete('calculations/:id')
  @HttpCode(204)
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  async removeDraft(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<void> {
    const files = await this.calculations.remove(ability, user, id);
    await this.attachments.removeFiles(files);
  }
}
