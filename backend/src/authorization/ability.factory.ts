import { AbilityBuilder, createMongoAbility } from '@casl/ability';
import { Injectable } from '@nestjs/common';
import type { User } from '../users/user.entity';
import type { AppAbility } from './app-ability';
import { isLicensed } from './licence';

/**
 * The one place that says who may do what. The client rebuilds the same ability from
 * `ability.rules` (GET /api/auth/me), so screens hide what the server would refuse.
 * Features that add subjects extend the rules here.
 */
@Injectable()
export class AbilityFactory {
  createForUser(user: User, today: Date = new Date()): AppAbility {
    const { can, cannot, build } = new AbilityBuilder<AppAbility>(createMongoAbility);

    // Everyone signed in reads their own account, may run a stateless analysis and may see the
    // engine checked against its reference cases.
    can('read', 'User', { id: user.id });
    can('create', 'Analysis');
    can('read', 'Library');
    can('read', 'Verification');

    switch (user.role) {
      case 'admin':
        can('manage', 'User');
        can('read', 'Project');
        // An admin may not deactivate or demote itself: that could lock the firm out.
        cannot('update', 'User', ['active', 'role'], { id: user.id }).because(
          'You cannot deactivate your own account or change your own role',
        );
        can('read', 'Outbox');
        can('read', 'Calculation');
        can('read', 'AuditTrail');
        break;
      case 'designer':
        can('create', 'Project');
        // Every project is readable; only its members edit it (memberIds holds the caller).
        can('read', 'Project');
        can(['update', 'delete'], 'Project', { memberIds: user.id });
        can('read', 'Calculation');
        // Drafts in the designer's own projects: create, edit and analyse.
        can('create', 'Calculation', { projectMemberIds: user.id });
        can(['update', 'analyse', 'submit'], 'Calculation', {
          projectMemberIds: user.id,
          status: 'draft',
        });
        can('revise', 'Calculation', { projectMemberIds: user.id, status: 'locked' });
        // A draft's author may throw it away (the entity refuses one that went to review).
        can('delete', 'Calculation', { authorId: user.id, status: 'draft' });
        // Designers of the project answer and resolve the review's comments.
        can('comment', 'Calculation', { projectMemberIds: user.id });
        can('update', 'ReviewComment', { projectMemberIds: user.id });
        break;
      case 'reviewer':
        can('read', 'Project');
        can('read', 'Calculation');
        can(['comment', 'return'], 'Calculation');
        can('update', 'ReviewComment');
        can('read', 'AuditTrail');
        if (isLicensed(user, today)) {
          can('lock', 'Calculation');
          cannot('lock', 'Calculation', { authorId: user.id }).because(
            'A reviewer cannot lock a calculation it wrote',
          );
        }
        break;
      case 'student':
        // Students read calcs of record only, never drafts.
        can('read', 'Calculation', { status: { $in: ['locked', 'superseded'] } });
        break;
    }
    return build();
  }
}
