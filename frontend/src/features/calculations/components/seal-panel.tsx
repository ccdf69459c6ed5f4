import { Alert, AlertTitle, Box, Card, CardContent, Skeleton, Typography } from '@mui/material';
import { formatDateTime, type CalculationDto } from '@tiermode/shared-types';
import { errorMessages } from '@/lib/api-client';
import { useSeal } from '../api/calculations';

const when = (iso: string) => formatDateTime(iso);

const SIGNATURE = {
  valid: 'verifies with the server’s key',
  invalid: 'does not verify',
  absent: 'none (sealed before seals were signed, or removed)',
} as const;
const LOCK_EVENT = {
  valid: 'on the audit trail, signed',
  missing: 'missing from the audit trail',
  invalid: 'changed, or names another seal',
} as const;

/**
 * The seal of a locked calc: who accepted it, under which licence, when, the statement, the hash
 * and its signature, and whether each still holds: the hash recomputed from what is stored, the
 * signature, and the lock's event on the audit trail.
 */
export function SealPanel({ calc }: { calc: CalculationDto }) {
  const check = useSeal(calc.id, calc.seal !== null);
  const seal = calc.seal;
  if (!seal) return null;
  return (
    <Card variant="outlined" component="section" aria-label="Seal">
      <CardContent>
        <Typography variant="h2" gutterBottom>
          Seal
        </Typography>
        {check.isPending && <Skeleton variant="rounded" height={48} />}
        {check.isError && (
          <Alert severity="error">
            The seal could not be checked: {errorMessages(check.error).join(' ')}
          </Alert>
        )}
        {check.data?.valid === true && (
          <Alert severity="success" role="status">
            The seal is valid: the stored inputs and results are exactly those the reviewer locked,
            the signature verifies and the lock is on the audit trail.
          </Alert>
        )}
        {check.data?.valid === false && (
          <Alert severity="error" role="alert">
            <AlertTitle>The seal does not hold</AlertTitle>
            {check.data.problems.join('. ')}. This calc was changed after it was locked, outside the
            application. Do not rely on it: tell your admin, and treat the printed, signed calc
            package as the record. Recomputed hash: <code>{check.data.recomputed}</code>
          </Alert>
        )}
        <Box
          component="dl"
          sx={{
            display: 'grid',
            gridTemplateColumns: 'max-content 1fr',
            columnGap: 2,
            rowGap: 0.5,
            mt: 2,
          }}
        >
          <dt>Accepted by</dt>
          <dd>{seal.reviewerName}</dd>
          <dt>Licence</dt>
          <dd>
            {seal.licenseNumber}, {seal.licenseJurisdiction}
          </dd>
          <dt>Locked</dt>
          <dd>{when(seal.lockedAt)}</dd>
          <dt>Statement</dt>
          <dd>{seal.statement}</dd>
          <dt>Seal (SHA-256)</dt>
          <dd>
            <code style={{ wordBreak: 'break-all' }}>{seal.hash}</code>
          </dd>
          <dt>Signature</dt>
          <dd>
            {check.data ? SIGNATURE[check.data.signature] : '…'}
            {seal.keyId && ` (Ed25519, key ${seal.keyId})`}
          </dd>
          <dt>Lock event</dt>
          <dd>{check.data ? LOCK_EVENT[check.data.lockEvent] : '…'}</dd>
        </Box>
      </CardContent>
    </Card>
  );
}
