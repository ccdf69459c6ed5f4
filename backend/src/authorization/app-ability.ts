import type { MongoAbility, MongoQuery } from '@casl/ability';
import type { Action, Subject } from '@tiermode/shared-types';
import type { User } from '../users/user.entity';

/** The plain record a project's rules are checked against (see projects/project.mapper.ts). */
export interface ProjectRecord {
  id: string;
  memberIds: string[];
}

/** The plain record a calculation's rules are checked against (calculations/calculation.mapper.ts). */
export interface CalculationRecord {
  id: string;
  status: string;
  authorId: string;
  projectMemberIds: string[];
}

/** The plain record a review comment's rules are checked against. */
export interface ReviewCommentRecord {
  id: string;
  projectMemberIds: string[];
}

/** What a rule may be checked against: a subject name, or a record tagged with `subject()`. */
type SubjectRecords = {
  User: User;
  Project: ProjectRecord;
  Calculation: CalculationRecord;
  ReviewComment: ReviewCommentRecord;
};
export type AppSubject = Subject | SubjectRecords[keyof SubjectRecords];
export type AppAbility = MongoAbility<[Action, AppSubject], MongoQuery>;
