/** The four kinds of user. A reviewer is *licensed* when it holds a current licence. */
export const ROLES = ['admin', 'designer', 'reviewer', 'student'] as const;
export type Role = (typeof ROLES)[number];

/** Words shown on screen for each role. */
export const ROLE_LABELS: Readonly<Record<Role, string>> = {
  admin: 'Admin',
  designer: 'Designer',
  reviewer: 'Reviewer',
  student: 'Student',
};
