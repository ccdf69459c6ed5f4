import type { AnalysisRequest, AnalysisResponse } from './analysis';
import type { AnalysisSummary } from './analysis-detail';
import type { ChecksResponse, CodeBasisParameters } from './checks';
import type { CodeBasis } from './projects';
import type { ResponseHistoryResult, ResponseHistorySetup } from './response-history';

export const CALCULATION_STATUSES = ['draft', 'submitted', 'locked', 'superseded'] as const;
export type CalculationStatus = (typeof CALCULATION_STATUSES)[number];

/** How a calc's values are shown and typed: SI (t, kN/m, m) or US customary (kip, kip/in, ft). */
export const DISPLAY_UNITS = ['SI', 'US'] as const;
export type DisplayUnits = (typeof DISPLAY_UNITS)[number];

/** A calculation's inputs: the same shapes as `POST /api/analysis`. */
export type CalculationInputs = AnalysisRequest;

/** `GET /api/calculations/:id` and the items of `GET /api/projects/:id/calculations`. */
export interface CalculationDto {
  id: string;
  projectId: string;
  projectName: string;
  /** The designers of the project (who may edit its drafts), for the client's ability checks. */
  projectMemberIds: string[];
  title: string;
  revision: number;
  status: CalculationStatus;
  inputs: CalculationInputs;
  /** The units the calc is shown in; values are stored in SI whatever this says. */
  displayUnits: DisplayUnits;
  /** The code basis and its parameters; null until the designer sets one. */
  basis: CodeBasisParameters | null;
  /** The checks stored with the analysis (sealed with it), or null without a basis. */
  checks: ChecksResponse | null;
  /**
   * The stored analysis of the inputs, or null until analysed: its summary (no per-mode storey
   * vectors, no correlation matrix); `GET /api/calculations/:id/modal-responses` has the rest.
   */
  analysis: AnalysisSummary | null;
  /** The ground-motion record and how it is scaled, and the free vibration's start; or null. */
  history: ResponseHistorySetup | null;
  /**
   * True when the calc keeps a response history made with the stored analysis (sealed with it):
   * `GET /api/calculations/:id/history-results` has it (its histories are most of a calc's size).
   */
  hasHistoryResults: boolean;
  engineVersion: string | null;
  /** ISO times. */
  inputsChangedAt: string;
  analysedAt: string | null;
  /** True when the inputs changed after the stored analysis was made. */
  analysisStale: boolean;
  author: { id: string; name: string };
  reviewer: { id: string; name: string } | null;
  submittedAt: string | null;
  returnedAt: string | null;
  lockedAt: string | null;
  /** Present once locked. */
  seal: SealDto | null;
  /** The revision this one was revised from. */
  previousRevisionId: string | null;
  /** The revision made from this one, once it exists (a calc has at most one next revision). */
  nextRevision: { id: string; revision: number; status: CalculationStatus } | null;
  comments: ReviewCommentDto[];
  /** Files kept with the calc; their SHA-256 is sealed with it. */
  attachments: AttachmentDto[];
  createdAt: string;
  updatedAt: string;
  /** Optimistic-lock version; a PATCH carries the version it was read at. */
  version: number;
}

/** `POST /api/projects/:id/calculations`. */
export interface CreateCalculationRequest {
  title: string;
  inputs: CalculationInputs;
  /** Default `SI`. */
  displayUnits?: DisplayUnits;
  /** The response history's record and setup (e.g. from an exported calc); null for none. */
  history?: ResponseHistorySetup | null;
}

/** `PATCH /api/calculations/:id`. */
export interface UpdateCalculationRequest {
  version: number;
  title?: string;
  inputs?: CalculationInputs;
  displayUnits?: DisplayUnits;
  /** The code basis; null removes it. A change makes the stored results stale. */
  basis?: CodeBasisParameters | null;
  /** The response history's record and setup; null removes it. A change makes the results stale. */
  history?: ResponseHistorySetup | null;
}

/** The record a lock seals: who accepted the calc, under which licence, when, and the hash. */
export interface SealDto {
  /** SHA-256 (hex) of the RFC 8785 canonical JSON of the sealed content. */
  hash: string;
  reviewerId: string;
  reviewerName: string;
  licenseNumber: string;
  licenseJurisdiction: string;
  statement: string;
  /** ISO time of the lock. */
  lockedAt: string;
  /**
   * 2: the seal covers the calc's identity too (id, project, title, revision, author, status,
   * previous revision) and is signed. Absent on seals made before signing.
   */
  sealVersion?: 2;
  /** The project's and the author's names as they were at the lock (sealed). */
  projectName?: string;
  authorName?: string;
  /** The reviewer's licence expiry date at the lock (sealed). */
  licenseExpiresOn?: string | null;
  /**
   * Ed25519 signature (base64) of the UTF-8 text `tiermode-seal:<hash>`, by the key published at
   * `GET /api/seal/public-key` (whose id is `keyId`).
   */
  signature?: string;
  keyId?: string;
}

/**
 * `GET /api/calculations/:id/seal`: the stored hash and the one recomputed from what is stored,
 * the signature, and the calc's lock event on the audit trail, each judged on its own. `valid`
 * is all of them.
 */
export interface SealCheckResponse {
  valid: boolean;
  hash: string;
  recomputed: string;
  seal: SealDto;
  /** The recomputed hash equals the sealed one. */
  hashValid: boolean;
  /** The seal's signature: valid, invalid, or absent (a seal made before signing). */
  signature: 'valid' | 'invalid' | 'absent';
  /** The calc's lock event on the audit trail, naming this hash, signed and whole. */
  lockEvent: 'valid' | 'missing' | 'invalid';
  /** What is wrong, in words; empty when valid. */
  problems: string[];
}

/** `GET /api/seal/public-key`: the key that signs seals and audit events, for anyone to verify. */
export interface SealPublicKeyResponse {
  algorithm: 'Ed25519';
  keyId: string;
  /** SubjectPublicKeyInfo, PEM: what `openssl pkeyutl -verify -pubin -inkey` reads. */
  publicKeyPem: string;
  /** The UTF-8 texts that are signed: `<value>` is the seal's hash, or the event's hash. */
  messages: { seal: string; auditEvent: string; auditHead: string };
}

/** `POST /api/calculations/:id/return`. */
export interface ReturnCalculationRequest {
  comment: string;
}

/** `POST /api/calculations/:id/lock`. */
export interface LockCalculationRequest {
  /** The reviewer's statement of acceptance, sealed with the calc. */
  statement: string;
}

export interface ReviewCommentDto {
  id: string;
  author: { id: string; name: string };
  body: string;
  /** What the comment is about, e.g. "storey 3" or "CQC base shear"; null for the whole calc. */
  target: string | null;
  /** The storey (1 = the base) it is tied to, marked on that storey's row; or null. */
  storey: number | null;
  /** The comment it answers (always a first comment, never a reply); null for a first comment. */
  parentId: string | null;
  resolved: boolean;
  createdAt: string;
}

/** A file kept with a calc (`POST /api/calculations/:id/attachments`). */
export interface AttachmentDto {
  id: string;
  fileName: string;
  contentType: 'application/pdf' | 'image/png' | 'image/jpeg';
  size: number;
  sha256: string;
  uploadedBy: { id: string; name: string };
  uploadedAt: string;
}

/** `POST /api/calculations/:id/comments`. */
export interface CreateCommentRequest {
  body: string;
  target?: string;
  /** Ties the comment to a storey of the calc (1 = the base). */
  storey?: number;
  /** Answers a comment of the same calc; a reply to a reply answers its first comment. */
  parentId?: string;
}

/** `PATCH /api/comments/:id`. */
export interface UpdateCommentRequest {
  resolved: boolean;
}

/** The items of `GET /api/calculations`: a calc as lists and the dashboard show it. */
export interface CalculationSummaryDto {
  id: string;
  projectId: string;
  projectName: string;
  title: string;
  revision: number;
  status: CalculationStatus;
  storeyCount: number;
  author: { id: string; name: string };
  reviewer: { id: string; name: string } | null;
  analysisStale: boolean;
  /** ISO times. */
  submittedAt: string | null;
  returnedAt: string | null;
  lockedAt: string | null;
  updatedAt: string;
  /** First comments not yet resolved (replies are not counted). */
  openComments: number;
}

/**
 * The query of `GET /api/calculations`, every part optional: `status` a comma-separated list,
 * `author=me` the caller's own, `notAuthor=me` everyone else's, `projectId` one project's,
 * `limit` at most 200 (default 100). Newest change first.
 */
export interface CalculationListQuery {
  status?: string;
  author?: 'me';
  notAuthor?: 'me';
  projectId?: string;
  limit?: number;
}

/** `GET /api/library`: a calc of record (locked or superseded), as the library lists it. */
export interface LibraryEntryDto {
  id: string;
  title: string;
  revision: number;
  status: 'locked' | 'superseded';
  projectId: string;
  projectName: string;
  codeBasis: CodeBasis;
  structuralSystem: string | null;
  storeyCount: number;
  /** m, from the base to the roof */
  buildingHeight: number;
  reviewerName: string;
  lockedAt: string;
  sealHash: string;
}

/**
 * `GET /api/calculations/:id/export.json`: the whole calc as one document. Its `calculation`
 * part, sent to `POST /api/projects/:id/calculations/import`, becomes a new draft with the same
 * title, inputs and display units (the rest is kept for the record and ignored on import).
 */
export interface CalculationExport {
  format: 'tiermode-calculation';
  formatVersion: 1;
  exportedAt: string;
  calculation: {
    title: string;
    revision: number;
    status: CalculationStatus;
    projectName: string;
    author: string;
    reviewer: string | null;
    displayUnits: DisplayUnits;
    inputs: CalculationInputs;
    analysis: AnalysisResponse | null;
    engineVersion: string | null;
    analysedAt: string | null;
    seal: SealDto | null;
    /** The response history's record and setup, and its results (absent in older files). */
    history?: ResponseHistorySetup | null;
    historyResults?: ResponseHistoryResult | null;
    comments: {
      author: string;
      target: string | null;
      body: string;
      resolved: boolean;
      createdAt: string;
    }[];
  };
}

/**
 * A calc with its whole stored analysis and response history (`GET /api/calculations/:id?detail=full`): what the
 * exports, the calc package and the seal work from.
 */
export type WholeCalculationDto = Omit<CalculationDto, 'analysis'> & {
  analysis: AnalysisResponse | null;
  /** The response history made with the stored analysis (sealed with it), or null. */
  historyResults: ResponseHistoryResult | null;
};

/** `GET /api/calculations/:id`: the summary by default, the whole with `detail=full`. */
export type CalculationAnswer = CalculationDto | WholeCalculationDto;
