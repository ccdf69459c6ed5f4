import { createHash } from 'node:crypto';
import canonicalize from 'canonicalize';
import type { AnalysisResponse, CalculationInputs } from '@tiermode/shared-types';

/**
 * Everything a lock seals. A version-2 seal adds the calc's identity (see sealedContentOf); the
 * first seals had only the fields below.
 */
export interface SealedContent {
  sealVersion?: 2;
  calculationId?: string;
  projectId?: string;
  projectName?: string;
  title?: string;
  revision?: number;
  status?: string;
  authorId?: string;
  authorName?: string;
  previousRevisionId?: string | null;
  reviewerId?: string;
  licenseExpiresOn?: string | null;
  inputs: CalculationInputs;
  analysis: AnalysisResponse;
  engineVersion: string;
  reviewerName: string;
  licenseNumber: string;
  licenseJurisdiction: string;
  statement: string;
  lockedAt: string;
  /** The code basis and the checks made with the analysis; absent when there is no basis. */
  basis?: unknown;
  checks?: unknown;
  /** The response history's record and setup and its results; absent when there is none. */
  history?: unknown;
  historyResults?: unknown;
  /** The files kept with the calc, by name and SHA-256; absent when there are none. */
  attachments?: { fileName: string; sha256: string; size: number }[];
}

/**
 * SHA-256 (hex) of the RFC 8785 canonical JSON (the `canonicalize` package) of the sealed content:
 * the same content always gives the same hash, whatever the order of keys it was stored in.
 */
export function sealHash(content: SealedContent): string {
  const canonical = canonicalize(content);
  if (canonical === undefined) throw new Error('The sealed content cannot be written as JSON');
  return createHash('sha256').update(canonical, 'utf8').digest('hex');
}
