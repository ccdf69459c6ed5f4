import { formatDateTime } from '@tiermode/shared-types';
import { Alert, Box, Link, Stack, Typography } from '@mui/material';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import type { AuditEventDto, CalculationDto } from '@tiermode/shared-types';
import { Link as RouterLink } from 'react-router';
import { errorMessages } from '@/lib/api-client';
import { useCalculations, useHistory } from '../api/calculations';
import { StatusChip } from '@/components/feedback/status-chip';

const ACTION_WORDS: Record<string, string> = {
  created: 'Created',
  edited: 'Inputs or title changed',
  analysed: 'Analysed',
  submitted: 'Submitted for review',
  returned: 'Returned to the designer',
  locked: 'Locked and sealed',
  revised: 'Revision started',
  commented: 'Commented',
  replied: 'Replied to a comment',
  'comment resolved': 'Comment resolved',
  'comment reopened': 'Comment reopened',
};

const columns: GridColDef<AuditEventDto>[] = [
  { field: 'seq', headerName: 'No.', width: 70, type: 'number' },
  {
    field: 'at',
    headerName: 'When',
    width: 190,
    valueFormatter: (value: string) => formatDateTime(value),
  },
  { field: 'actorName', headerName: 'Who', width: 150 },
  {
    field: 'action',
    headerName: 'What',
    flex: 1,
    minWidth: 200,
    // An edit names what it changed: "Inputs or title changed: storey 2 mass, spectrum points".
    valueGetter: (_value, row) => {
      const words = ACTION_WORDS[row.action] ?? row.action;
      const changes = row.detail?.changes;
      return Array.isArray(changes) && changes.length > 0
        ? `${words}: ${changes.map(String).join(', ')}`
        : words;
    },
  },
  {
    field: 'hash',
    headerName: 'Event hash',
    width: 140,
    valueFormatter: (value: string) => `${value.slice(0, 12)}…`,
  },
];

/** The revisions of this calc and its audit trail (a hash chain), oldest event first. */
export function HistoryPanel({ calc }: { calc: CalculationDto }) {
  const history = useHistory(calc.id);
  const siblings = useCalculations({ projectId: calc.projectId });
  const revisions = (siblings.data ?? [])
    .filter((c) => c.title === calc.title)
    .sort((a, b) => b.revision - a.revision);
  return (
    <Stack spacing={2}>
      <Typography variant="h3">Revisions</Typography>
      {revisions.length > 0 ? (
        <Stack component="ul" spacing={0.5} sx={{ pl: 2, m: 0 }} aria-label="Revisions">
          {revisions.map((r) => (
            <li key={r.id}>
              <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
                {r.id === calc.id ? (
                  <Typography component="span">Revision {r.revision} (this one)</Typography>
                ) : (
                  <Link component={RouterLink} to={`/calculations/${r.id}`}>
                    Revision {r.revision}
                  </Link>
                )}
                <StatusChip status={r.status} />
              </Stack>
            </li>
          ))}
        </Stack>
      ) : (
        <Typography color="text.secondary">Revision {calc.revision}.</Typography>
      )}
      <Typography variant="h3">Audit trail</Typography>
      <Typography variant="body2" color="text.secondary">
        Each event carries the hash of the one before it, so a changed or missing event breaks the
        chain.
      </Typography>
      {history.isError && <Alert severity="error">{errorMessages(history.error).join(' ')}</Alert>}
      <Box sx={{ height: 360 }}>
        <DataGrid
          aria-label="Audit trail"
          rows={history.data ?? []}
          getRowId={(e) => e.seq}
          columns={columns}
          loading={history.isPending}
          density="compact"
          disableColumnMenu
          disableRowSelectionOnClick
        />
      </Box>
    </Stack>
  );
}
