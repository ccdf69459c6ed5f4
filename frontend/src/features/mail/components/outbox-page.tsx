import { formatDateTime } from '@tiermode/shared-types';
import { Alert, Box, Card, CardContent, Chip, Stack, Typography } from '@mui/material';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import type { MailMessageDto } from '@tiermode/shared-types';
import { useState } from 'react';
import { errorMessages } from '@/lib/api-client';
import { useOutbox } from '../api/outbox';

const STATUS_WORDS: Record<MailMessageDto['status'], string> = {
  received: 'Received by the catcher',
  sent: 'Sent',
  queued: 'Waiting to be sent again',
  failed: 'Failed',
};

const columns: GridColDef<MailMessageDto>[] = [
  {
    field: 'createdAt',
    headerName: 'When',
    width: 180,
    valueFormatter: (value: string) => formatDateTime(value),
  },
  { field: 'to', headerName: 'To', flex: 1, minWidth: 200 },
  { field: 'subject', headerName: 'Subject', flex: 3, minWidth: 320 },
  {
    field: 'status',
    headerName: 'Status',
    width: 210,
    renderCell: ({ row }) => (
      <Chip
        size="small"
        color={row.status === 'failed' ? 'error' : row.status === 'queued' ? 'warning' : 'default'}
        label={STATUS_WORDS[row.status]}
      />
    ),
  },
  { field: 'attempts', headerName: 'Attempts', type: 'number', width: 90 },
  { field: 'lastError', headerName: 'Last error', flex: 1, minWidth: 160 },
];

/** Every message the product sent, once each: sent, waiting, or failed with its error. */
export function OutboxPage() {
  const outbox = useOutbox();
  const [openId, setOpenId] = useState<string | null>(null);
  const rows = outbox.data ?? [];
  const open = rows.find((m) => m.id === openId);
  return (
    <Stack spacing={2}>
      <Typography variant="h1">Outbox</Typography>
      <Typography color="text.secondary">
        Mail goes out over SMTP (to the local catcher when no mail server is configured). Each
        message appears once: sent, waiting, or failed with its error. Select a message to read it.
      </Typography>
      {outbox.isError && <Alert severity="error">{errorMessages(outbox.error).join(' ')}</Alert>}
      <Box sx={{ height: Math.min(520, 160 + rows.length * 52) }}>
        <DataGrid
          aria-label="Outbox"
          rows={rows}
          columns={columns}
          loading={outbox.isPending}
          onRowClick={(params) => setOpenId(String(params.id))}
          localeText={{ noRowsLabel: 'No mail yet' }}
        />
      </Box>
      {open && (
        <Card variant="outlined" component="section" aria-label="Message">
          <CardContent>
            <Typography variant="h3">{open.subject}</Typography>
            <Typography variant="body2" color="text.secondary" gutterBottom>
              From {open.from} to {open.to}
            </Typography>
            <Typography component="pre" sx={{ whiteSpace: 'pre-wrap', fontFamily: 'inherit' }}>
              {open.text}
            </Typography>
          </CardContent>
        </Card>
      )}
    </Stack>
  );
}
