/**
 * Action and subject names shared by the server's ability factory (@casl/ability) and the
 * client, which rebuilds the same ability from the rules in `GET /api/auth/me`.
 */
export const ACTIONS = [
  'manage',
  'create',
  'read',
  'update',
  'delete',
  'analyse',
  'submit',
  'return',
  'lock',
  'revise',
  'comment',
] as const;
export type Action = (typeof ACTIONS)[number];

export const SUBJECTS = [
  'all',
  'User',
  'Project',
  'Calculation',
  'ReviewComment',
  'Library',
  'Outbox',
  'Analysis',
  'Verification',
  'AuditTrail',
] as const;
export type Subject = (typeof SUBJECTS)[number];

/**
 * One rule as @casl/ability serialises it (`ability.rules`). Kept structural so this package has
 * no runtime dependency; it is assignable to CASL's RawRuleOf<MongoAbility<[Action, Subject]>>.
 */
export interface AbilityRule {
  action: Action | Action[];
  subject: Subject | Subject[];
  conditions?: Record<string, unknown>;
  fields?: string | string[];
  inverted?: boolean;
  reason?: string;
}
