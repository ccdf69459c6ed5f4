import { ConflictException } from '@nestjs/common';
import type { SealDto } from '@tiermode/shared-types';
import type { User } from '../users/user.entity';
import type { Calculation } from './calculation.entity';
import { sealHash, type SealedContent } from './seal';

/** The content a calc's seal covers, from what is stored, or null when there is no analysis. */
export function sealedContentOf(
  calc: Calculation,
  seal: Omit<SealDto, 'hash' | 'reviewerId'>,
): SealedContent | null {
  if (!calc.analysis || !calc.engineVersion) return null;
  return {
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
 * The seal of a submitted calc about to be locked: the reviewer's name, licence and statement,
 * the time, and the hash of everything sealed. The entity's `lock` sets it; the caller has
 * checked who may lock.
 */
export function sealOf(
  calc: Calculation,
  reviewer: User,
  statement: string,
  lockedAt: Date,
): SealDto {
  const fields = {
    reviewerName: reviewer.name,
    licenseNumber: reviewer.licenseNumber ?? '',
    licenseJurisdiction: reviewer.licenseJurisdiction ?? '',
    statement,
    lockedAt: lockedAt.toISOString(),
  };
  const content = sealedContentOf(calc, fields);
  if (!content) {
    throw new ConflictException('This calculation cannot be locked: it has no stored analysis');
  }
  return { hash: sealHash(content), reviewerId: reviewer.id, ...fields };
}
