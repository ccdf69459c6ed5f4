import { summariseAnalysis, type AttachmentDto, type CalculationDto } from '@tiermode/shared-types';
import type { CalculationRecord } from '../authorization/app-ability';
import { projectSubject } from '../projects/project.mapper';
import type { Attachment } from './attachment.entity';
import type { Calculation } from './calculation.entity';

/**
 * The calculation as responses show it; its project's members, author, reviewer and comments
 * (with their authors) must be loaded.
 */
export function toCalculationDto(calc: Calculation): CalculationDto {
  return {
    id: calc.id,
    projectId: calc.project.id,
    projectName: calc.project.name,
    projectMemberIds: projectSubject(calc.project).memberIds,
    title: calc.title,
    revision: calc.revision,
    status: calc.status,
    inputs: calc.inputs,
    displayUnits: calc.displayUnits,
    basis: calc.basis,
    checks: calc.checks,
    history: calc.history,
    hasHistoryResults: calc.historyResults !== null,
    // The summary: the per-mode storey vectors and rho are GET .../modal-responses.
    analysis: calc.analysis ? summariseAnalysis(calc.analysis) : null,
    engineVersion: calc.engineVersion,
    inputsChangedAt: calc.inputsChangedAt.toISOString(),
    analysedAt: calc.analysedAt?.toISOString() ?? null,
    analysisStale: isAnalysisStale(calc),
    author: { id: calc.author.id, name: calc.author.name },
    reviewer: calc.reviewer ? { id: calc.reviewer.id, name: calc.reviewer.name } : null,
    submittedAt: calc.submittedAt?.toISOString() ?? null,
    returnedAt: calc.returnedAt?.toISOString() ?? null,
    lockedAt: calc.lockedAt?.toISOString() ?? null,
    seal: calc.seal,
    previousRevisionId: calc.previousRevision?.id ?? null,
    nextRevision: nextRevisionOf(calc),
    comments: calc.comments.isInitialized()
      ? calc.comments.getItems().map((c) => ({
          id: c.id,
          author: { id: c.author.id, name: c.author.name },
          body: c.body,
          target: c.target,
          storey: c.storey,
          parentId: c.parent?.id ?? null,
          resolved: c.resolved,
          createdAt: c.createdAt.toISOString(),
        }))
      : [],
    attachments: calc.attachments.isInitialized()
      ? calc.attachments.getItems().map(toAttachmentDto)
      : [],
    createdAt: calc.createdAt.toISOString(),
    updatedAt: calc.updatedAt.toISOString(),
    version: calc.version,
  };
}

/** The next revision, where the relation was loaded and one exists. */
function nextRevisionOf(calc: Calculation): CalculationDto['nextRevision'] {
  const next = calc.nextRevisions.isInitialized() ? calc.nextRevisions.getItems()[0] : undefined;
  return next ? { id: next.id, revision: next.revision, status: next.status } : null;
}

export function toAttachmentDto(a: Attachment): AttachmentDto {
  return {
    id: a.id,
    fileName: a.fileName,
    contentType: a.contentType as AttachmentDto['contentType'],
    size: a.size,
    sha256: a.sha256,
    uploadedBy: { id: a.uploadedBy.id, name: a.uploadedBy.name },
    uploadedAt: a.uploadedAt.toISOString(),
  };
}

/** True when the inputs changed after the stored analysis was made (or none was made). */
export function isAnalysisStale(
  calc: Pick<Calculation, 'analysedAt' | 'inputsChangedAt'>,
): boolean {
  return calc.analysedAt === null || calc.analysedAt < calc.inputsChangedAt;
}

/** The plain record CASL's conditions are checked against. */
export function calculationSubject(
  calc: Pick<Calculation, 'id' | 'status' | 'author' | 'project'>,
): CalculationRecord {
  return {
    id: calc.id,
    status: calc.status,
    authorId: calc.author.id,
    projectMemberIds: projectSubject(calc.project).memberIds,
  };
}
