import { formatDateTime } from '@tiermode/shared-types';
import AttachFileIcon from '@mui/icons-material/AttachFile';
import { Alert, Box, Button, Link, Stack, Typography } from '@mui/material';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import type { AttachmentDto, CalculationDto } from '@tiermode/shared-types';
import { useState } from 'react';
import { FileDrop } from '@/components/feedback/file-drop';
import { errorMessages } from '@/lib/api-client';
import { downloadFile } from '@/lib/download';
import { useAttach, useRemoveAttachment } from '../api/calculations';

const KIB = 1024;
const size = (bytes: number) =>
  bytes < KIB
    ? `${bytes} B`
    : bytes < KIB * KIB
      ? `${(bytes / KIB).toFixed(1)} KiB`
      : `${(bytes / KIB / KIB).toFixed(2)} MiB`;

const baseColumns: GridColDef<AttachmentDto>[] = [
  {
    field: 'fileName',
    headerName: 'File',
    flex: 2,
    minWidth: 200,
    renderCell: ({ row }) => (
      <Link
        component="button"
        type="button"
        onClick={() => void downloadFile(`/attachments/${row.id}`, row.fileName)}
      >
        {row.fileName}
      </Link>
    ),
  },
  { field: 'contentType', headerName: 'Type', width: 140 },
  { field: 'size', headerName: 'Size', width: 100, valueFormatter: (v: number) => size(v) },
  {
    field: 'sha256',
    headerName: 'SHA-256',
    width: 150,
    valueFormatter: (v: string) => `${v.slice(0, 16)}…`,
  },
  {
    field: 'uploadedBy',
    headerName: 'Added by',
    width: 150,
    valueGetter: (_v, row) => row.uploadedBy.name,
  },
  {
    field: 'uploadedAt',
    headerName: 'Added',
    width: 170,
    valueFormatter: (v: string) => formatDateTime(v),
  },
];

/**
 * Drawings and letters kept with the calc; their SHA-256 is sealed with it when it is locked.
 * While it is a draft, its author may take a file back (`removable`).
 */
export function AttachmentsPanel({
  calc,
  editable,
  removable,
}: {
  calc: CalculationDto;
  editable: boolean;
  removable: boolean;
}) {
  const [progress, setProgress] = useState(0);
  const attach = useAttach(calc.id, setProgress);
  const remove = useRemoveAttachment();
  const columns: GridColDef<AttachmentDto>[] = removable
    ? [
        ...baseColumns,
        {
          field: 'remove',
          headerName: '',
          width: 110,
          sortable: false,
          renderCell: ({ row }) => (
            <Button
              size="small"
              color="error"
              disabled={remove.isPending}
              aria-label={`Remove ${row.fileName}`}
              onClick={() => remove.mutate(row.id)}
            >
              Remove
            </Button>
          ),
        },
      ]
    : baseColumns;
  return (
    <Stack spacing={1}>
      {calc.attachments.length > 0 ? (
        <Box sx={{ height: Math.min(320, 110 + calc.attachments.length * 52) }}>
          <DataGrid
            aria-label="Attachments"
            rows={calc.attachments}
            columns={columns}
            density="compact"
            disableColumnMenu
            hideFooter
          />
        </Box>
      ) : (
        <Typography color="text.secondary">No files are kept with this calc.</Typography>
      )}
      <FileDrop
        accept={{
          'application/pdf': ['.pdf'],
          'image/png': ['.png'],
          'image/jpeg': ['.jpg', '.jpeg'],
        }}
        inputLabel="Attachment file"
        kinds=".pdf, .png, .jpg or .jpeg"
        icon={<AttachFileIcon />}
        disabled={!editable}
        uploading={attach.isPending}
        progress={progress}
        onFile={(file) => {
          setProgress(0);
          attach.mutate(file);
        }}
      >
        Drop a drawing or a letter here (PDF, PNG or JPEG, at most 10 MB), or click to choose one.
        Its SHA-256 is sealed with the calc when it is locked.
      </FileDrop>
      {(attach.isError || remove.isError) && (
        <Alert severity="error" role="alert">
          {errorMessages(attach.error ?? remove.error).join(' ')}
        </Alert>
      )}
    </Stack>
  );
}
