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
}

/** `PATCH /api/projects/:id` (members). */
export interface UpdateProjectRequest {
  version?: number;
  name?: string;
  site?: string | null;
  /** The designers who are members; the caller must stay one. */
  memberIds?: string[];
}
