import { Card, CardContent, Chip, Stack, Typography } from '@mui/material';
import type { ReactNode } from 'react';
import { ROLE_LABELS, type Role, type UserDto } from '@tiermode/shared-types';
import { CautionBanner } from '@/components/feedback/caution-banner';
import { useMe } from '@/features/auth/api/get-me';
import { CalculationList } from '@/features/calculations/components/calculation-list';
import { useAppAbility } from '@/lib/ability';

/** What each role does in the firm's calculation workflow (product.md). */
const ROLE_DUTIES: Record<Role, string> = {
  designer:
    'Enter storey masses and stiffnesses, choose the design spectrum, read the modes and responses, run the checks and submit calcs for review.',
  reviewer:
    'Read the inputs, intermediate values and results of submitted calcs, comment, return them, or lock them as the calc of record when licensed.',
  student: 'Read locked calcs in the library, with every step of the method shown.',
  admin: 'Manage people, their roles and reviewers’ licence details, and read the mail outbox.',
};

function LicenceCard({ user, canLock }: { user: UserDto; canLock: boolean }) {
  return (
    <Card variant="outlined">
      <CardContent>
        <Typography variant="h3" component="h2" gutterBottom>
          Your licence
        </Typography>
        {user.licenseNumber ? (
          <Typography>
            {user.licenseNumber}, {user.licenseJurisdiction ?? 'no jurisdiction recorded'}, valid
            through {user.licenseExpiresOn ?? 'no expiry recorded'}.
          </Typography>
        ) : (
          <Typography>No licence is recorded for you.</Typography>
        )}
        <Chip
          sx={{ mt: 1 }}
          color={canLock ? 'success' : 'default'}
          label={canLock ? 'You may lock calcs you did not author' : 'You may not lock calcs'}
        />
      </CardContent>
    </Card>
  );
}

function DashboardList({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Stack spacing={1} component="section" aria-label={title}>
      <Typography variant="h2">{title}</Typography>
      {children}
    </Stack>
  );
}

export function HomeRoute() {
  const me = useMe(true);
  const ability = useAppAbility();
  if (!me.data) return null;
  const { user } = me.data;
  return (
    <Stack spacing={2} sx={{ maxWidth: 1200 }}>
      <Typography variant="h1">Welcome, {user.name}</Typography>
      <CautionBanner />
      <Card variant="outlined">
        <CardContent>
          <Typography variant="h3" component="h2" gutterBottom>
            Your role: {ROLE_LABELS[user.role]}
          </Typography>
          <Typography>{ROLE_DUTIES[user.role]}</Typography>
        </CardContent>
      </Card>
      {user.role === 'reviewer' && (
        <LicenceCard user={user} canLock={ability.can('lock', 'Calculation')} />
      )}
      {user.role === 'designer' && (
        <DashboardList title="My drafts">
          <CalculationList
            query={{ status: 'draft', author: 'me' }}
            label="My drafts"
            empty="No drafts: create a calc in a project"
          />
        </DashboardList>
      )}
      {(user.role === 'designer' || user.role === 'reviewer') && (
        <DashboardList
          title={user.role === 'reviewer' ? 'Waiting for my review' : 'Mine, waiting for review'}
        >
          <CalculationList
            query={
              user.role === 'reviewer'
                ? { status: 'submitted', notAuthor: 'me' }
                : { status: 'submitted', author: 'me' }
            }
            label={user.role === 'reviewer' ? 'Waiting for my review' : 'Mine, waiting for review'}
            empty="Nothing is waiting for review"
          />
        </DashboardList>
      )}
      <DashboardList title="Recently locked">
        <CalculationList
          query={{ status: 'locked', limit: 10 }}
          label="Recently locked"
          empty="No calc has been locked yet"
        />
      </DashboardList>
    </Stack>
  );
}
