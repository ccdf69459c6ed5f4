import { subject } from '@casl/ability';
import { EntityManager, type FilterQuery } from '@mikro-orm/knex';
import { Injectable } from '@nestjs/common';
import type { CalculationSummaryDto, LibraryEntryDto } from '@tiermode/shared-types';
import { accessibleWhere } from '../authorization/accessible-where';
import type { AppAbility } from '../authorization/app-ability';
import type { User } from '../users/user.entity';
import { Calculation } from './calculation.entity';
import { ReviewComment } from './review-comment.entity';
import { calculationSubject, isAnalysisStale } from './calculation.mapper';
import type { ListCalculationsDto } from './dto/list-calculations.dto';

const POPULATE = ['project.members', 'author', 'reviewer'] as const;
const LARGE_COLUMNS = [
  'analysis',
  'checks',
  'returnedInputs',
  'returnedBasis',
  'returnedHistory',
  'history',
  'historyResults',
] as const;

/** The lists of calcs: the firm-wide list behind the dashboard and project pages, and the library. */
@Injectable()
export class CalculationListsService {
  constructor(private readonly em: EntityManager) {}

  /** Calcs the caller may read, filtered by the query, newest change first. */
  async list(
    ability: AppAbility,
    caller: User,
    query: ListCalculationsDto,
  ): Promise<CalculationSummaryDto[]> {
    const where = accessibleWhere(ability, 'read', 'Calculation');
    if (where === null) return [];
    const parts: FilterQuery<Calculation>[] = [where];
    if (query.status) parts.push({ status: { $in: query.status } });
    if (query.author === 'me') parts.push({ author: caller.id });
    if (query.notAuthor === 'me') parts.push({ author: { $ne: caller.id } });
    if (query.projectId) parts.push({ project: query.projectId });
    const calcs = await this.em.find(
      Calculation,
      { $and: parts },
      {
        populate: POPULATE,
        // A summary needs none of the results: leave the large JSON columns unread.
        exclude: LARGE_COLUMNS,
        orderBy: { updatedAt: 'desc' },
        limit: query.limit ?? 100,
      },
    );
    const readable = calcs.filter((c) =>
      ability.can('read', subject('Calculation', calculationSubject(c))),
    );
    // Open first comments per calc, for "Returned with comments (3)" on the dashboard.
    const open = await this.em.find(
      ReviewComment,
      { calculation: { $in: readable.map((c) => c.id) }, resolved: false, parent: null },
      { fields: ['calculation'] },
    );
    const openCount = new Map<string, number>();
    for (const comment of open) {
      openCount.set(comment.calculation.id, (openCount.get(comment.calculation.id) ?? 0) + 1);
    }
    return readable.map((c) => ({
      id: c.id,
      projectId: c.project.id,
      projectName: c.project.name,
      title: c.title,
      revision: c.revision,
      status: c.status,
      storeyCount: c.inputs.storeys.length,
      author: { id: c.author.id, name: c.author.name },
      reviewer: c.reviewer ? { id: c.reviewer.id, name: c.reviewer.name } : null,
      analysisStale: isAnalysisStale(c),
      submittedAt: c.submittedAt?.toISOString() ?? null,
      returnedAt: c.returnedAt?.toISOString() ?? null,
      lockedAt: c.lockedAt?.toISOString() ?? null,
      updatedAt: c.updatedAt.toISOString(),
      openComments: openCount.get(c.id) ?? 0,
    }));
  }

  /** Locked and superseded calcs the caller may read, newest lock first. */
  async library(ability: AppAbility): Promise<LibraryEntryDto[]> {
    const where = accessibleWhere(ability, 'read', 'Calculation');
    if (where === null) return [];
    const calcs = await this.em.find(
      Calculation,
      { $and: [{ status: { $in: ['locked', 'superseded'] } }, where] },
      { populate: POPULATE, exclude: LARGE_COLUMNS, orderBy: { lockedAt: 'desc' } },
    );
    return calcs
      .filter((c) => c.seal && ability.can('read', subject('Calculation', calculationSubject(c))))
      .map((c) => ({
        id: c.id,
        title: c.title,
        revision: c.revision,
        status: c.status as LibraryEntryDto['status'],
        projectId: c.project.id,
        projectName: c.project.name,
        codeBasis: c.project.codeBasis,
        structuralSystem: c.project.structuralSystem,
        storeyCount: c.inputs.storeys.length,
        buildingHeight: c.inputs.storeys.reduce((sum, s) => sum + s.height, 0),
        reviewerName: c.seal?.reviewerName ?? '',
        lockedAt: c.seal?.lockedAt ?? '',
        sealHash: c.seal?.hash ?? '',
      }));
  }
}
