import { ScrollFrame } from '@/components/data-display/scroll-frame';
import CheckCircleIcon from '@mui/icons-material/CheckCircle';
import ErrorIcon from '@mui/icons-material/Error';
import {
  Alert,
  Card,
  CardContent,
  Chip,
  LinearProgress,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import { CautionBanner } from '@/components/feedback/caution-banner';
import { errorMessages } from '@/lib/api-client';
import { formatNumber } from '@/lib/units';
import { useVerification } from '../api/get-verification';

/** The reference cases the engine is tested against, run by the server now. */
export function VerificationPage() {
  const cases = useVerification();
  return (
    <Stack spacing={2} sx={{ maxWidth: 1100 }}>
      <Typography variant="h1">Verification</Typography>
      <Typography color="text.secondary">
        The published reference cases the analysis engine is held to. The server runs each one now;
        the same cases run in the automated tests on every change.
      </Typography>
      <CautionBanner />
      {cases.isPending && <LinearProgress aria-label="Running the reference cases" />}
      {cases.isError && <Alert severity="error">{errorMessages(cases.error).join(' ')}</Alert>}
      {cases.data?.map((c) => (
        <Card key={c.id} variant="outlined" component="section" aria-label={c.title}>
          <CardContent>
            <Stack direction="row" spacing={1} sx={{ alignItems: 'center', mb: 1 }}>
              <Typography variant="h3" component="h2" sx={{ flexGrow: 1 }}>
                {c.title}
              </Typography>
              <Chip
                icon={c.pass ? <CheckCircleIcon /> : <ErrorIcon />}
                color={c.pass ? 'success' : 'error'}
                label={c.pass ? 'Pass' : 'Fail'}
              />
            </Stack>
            <Typography variant="body2" sx={{ mb: 1 }}>
              <strong>Source:</strong> {c.source}
            </Typography>
            <Typography variant="body2" sx={{ mb: 1 }}>
              <strong>Inputs:</strong> {c.inputs.join('; ')}
            </Typography>
            <ScrollFrame label={`${c.title}: values, scrolling`}>
              <Table size="small" aria-label={`${c.title}: values`}>
                <TableHead>
                  <TableRow>
                    <TableCell>Quantity</TableCell>
                    <TableCell align="right">Expected</TableCell>
                    <TableCell align="right">Computed now</TableCell>
                    <TableCell align="right">Difference (relative)</TableCell>
                    <TableCell align="right">Tolerance</TableCell>
                    <TableCell align="right">Result</TableCell>
                  </TableRow>
                </TableHead>
                <TableBody>
                  {c.rows.map((row) => (
                    <TableRow key={row.quantity}>
                      <TableCell>{row.quantity}</TableCell>
                      <TableCell align="right">{formatNumber(row.expected, 8)}</TableCell>
                      <TableCell align="right">{formatNumber(row.computed, 8)}</TableCell>
                      <TableCell align="right">{row.difference.toExponential(1)}</TableCell>
                      <TableCell align="right">{row.tolerance.toExponential(0)}</TableCell>
                      <TableCell align="right">{row.pass ? 'Pass' : 'Fail'}</TableCell>
                    </TableRow>
                  ))}
                </TableBody>
              </Table>
            </ScrollFrame>
            <Typography variant="caption" color="text.secondary">
              Engine version {c.engineVersion}
            </Typography>
          </CardContent>
        </Card>
      ))}
    </Stack>
  );
}
