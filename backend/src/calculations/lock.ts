import { ConflictException } from '@nestjs/common';
import type { SealDto } from '@tiermode/shared-types';
import type { SigningKey } from '../signing/signing-key';
import type { User } from '../users/user.entity';
import type { Calculation } from './calculation.entity';
import { sealHash, type SealedContent } from './seal';

/**
 * The content a calc's seal covers, from what is stored now, or null when there is no analysis.
 * A version-2 seal also covers the calc's identity as stored in its row (id, project, title,
 * revision, author, reviewer, previous revision, and that it is of record) and the names and
 * licence the seal itself records; a first-version seal covers what it covered when it was made.
 */
export function sealedContentOf(
  calc: Calculation,
  seal: Omit<SealDto, 'hash' | 'signature' | 'keyId'>,
  row: { status: string; reviewerId: string } = {
    status: calc.status,
    reviewerId: calc.reviewer?.id ?? '',
  },
): SealedContent | null {
  if (!calc.analysis || !calc.engineVersion) return null;
  const identity =
    seal.sealVersion === 2
      ? {
          sealVersion: 2 as const,
          calculationId: calc.id,
          projectId: calc.project.id,
          projectName: seal.projectName ?? '',
          title: calc.title,
          revision: calc.revision,
          // What the row says; a superseded calc was locked when it was sealed.
          status: row.status === 'superseded' ? 'locked' : row.status,
          authorId: calc.author.id,
          authorName: seal.authorName ?? '',
          previousRevisionId: calc.previousRevision?.id ?? null,
          reviewerId: row.reviewerId,
          licenseExpiresOn: seal.licenseExpiresOn ?? null,
        }
      : {};
  return {
    ...identity,
    inputs: calc.inputs,
    analysis: calc.analysis,
    engineVersion: calc.engineVersion,
    reviewerName: seal.reviewerName,
    licenseNumber: seal.licenseNumber,
    licenseJurisdiction: seal.licenseJurisdiction,
    statement: seal.statement,
    lockedAt: seal.lockedAt,
    // Only when present, so the seals of calcs without them stay as they were made.
    ...(calc.basis ? { basis: calc.basis, checks: calc.checks } : {}),
    ...(calc.history ? { history: calc.history, historyResults: calc.historyResults } : {}),
    ...(calc.attachments.isInitialized() && calc.attachments.length > 0
      ? {
          attachments: calc.attachments
            .getItems()
            .map((a) => ({ fileName: a.fileName, sha256: a.sha256, size: a.size }))
            .sort((a, b) => a.sha256.localeCompare(b.sha256)),
        }
      : {}),
  };
}

/**
 * The seal of a submitted calc being locked by `reviewer`: the reviewer's name, licence and
 * statement, the time, the hash of everything sealed (with the calc as it will be stored once
 * locked) and the Ed25519 signature of that hash. The entity's `lock` sets it; the caller has
 * checked who may lock.
 */
export function sealOf(
  calc: Calculation,
  reviewer: User,
  statement: string,
  lockedAt: Date,
  key: SigningKey,
): SealDto {
  const fields = {
    sealVersion: 2 as const,
    reviewerId: reviewer.id,
    reviewerName: reviewer.name,
    licenseNumber: reviewer.licenseNumber ?? '',
    licenseJurisdiction: reviewer.licenseJurisdiction ?? '',
    licenseExpiresOn: reviewer.licenseExpiresOn ?? null,
    projectName: calc.project.name,
    authorName: calc.author.name,
    statement,
    lockedAt: lockedAt.toISOString(),
  };
  // The row as the lock leaves it: locked, by this reviewer.
  const content = sealedContentOf(calc, fields, { status: 'locked', reviewerId: reviewer.id });
  if (!content) {
    throw new ConflictException('This calculation cannot be locked: it has no stored analysis');
  }
  const hash = sealHash(content);
  return { hash, ...fields, signature: key.sign('seal', hash), keyId: key.keyId };
}
