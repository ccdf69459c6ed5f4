/**
 * The code a project's seismic design follows: ASCE 7-22, EN 1998-1:2004, or user-defined
 * parameters. The same codes as the `basis.code` of `POST /api/checks`.
 */
export const CODE_BASES = ['ASCE7-22', 'EN1998-1', 'USER'] as const;
export type CodeBasis = (typeof CODE_BASES)[number];
export const CODE_BASIS_LABELS: Record<CodeBasis, string> = {
  'ASCE7-22': 'ASCE 7-22',
  'EN1998-1': 'EN 1998-1:2004',
  USER: 'User-defined',
};

/** A member of a project, as lists show it. */
export interface ProjectMemberDto {
  id: string;
  name: string;
}

/** `GET /api/projects`, `GET /api/projects/:id`. */
export interface ProjectDto {
  id: string;
  name: string;
  site: string | null;
  codeBasis: CodeBasis;
  /** The lateral system in the engineer's words, e.g. "reinforced concrete walls". */
  structuralSystem: string | null;
  /** Designers who may edit the project and its drafts. */
  members: ProjectMemberDto[];
  memberIds: string[];
  createdAt: string;
  updatedAt: string;
  /** Optimistic-lock version; send it back with a PATCH to refuse a stale edit. */
  version: number;
}

/** `POST /api/projects` (designers); the creator becomes a member. */
export interface CreateProjectRequest {
  name: string;
  site?: string;
  /** Default `USER`. */
  codeBasis?: CodeBasis;
  structuralSystem?: string;
}

/** `PATCH /api/projects/:id` (members). */
export interface UpdateProjectRequest {
  version?: number;
  name?: string;
  site?: string | null;
  codeBasis?: CodeBasis;
  structuralSystem?: string | null;
  /** The designers who are members; the caller must stay one. */
  memberIds?: string[];
}
