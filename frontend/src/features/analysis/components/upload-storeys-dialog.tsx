import UploadFileIcon from '@mui/icons-material/UploadFile';
import {
  Alert,
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Link,
  MenuItem,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import {
  DECIMAL_MARK_WORDS,
  DELIMITER_WORDS,
  type DecimalMark,
  type DisplayUnits,
  type ImportedStorey,
} from '@tiermode/shared-types';
import { useState } from 'react';
import { FileDrop } from '@/components/feedback/file-drop';
import { errorMessages } from '@/lib/api-client';
import { downloadFile } from '@/lib/download';
import { massHeader, toDisplay, unitLabel, type Quantity } from '@/lib/units';
import { templateUrl, useImportStoreys } from '../api/import-storeys';
import { newRowId, type StoreyRow } from '../model/storey-rows';

const ACCEPT = {
  'text/csv': ['.csv'],
  'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet': ['.xlsx'],
};

const download = (format: 'csv' | 'xlsx', units: DisplayUnits) =>
  downloadFile(templateUrl(format, units), `storey-table-template-${units}.${format}`);

type PreviewRow = ImportedStorey & { id: number; problems: string };

/**
 * Upload a storey table (CSV or XLSX, up to 2 MB), see what the server read with every problem
 * by row and column, and bring it into the grid, replacing or appending; cells that could not be
 * read arrive empty and flagged, to be fixed there.
 */
export function UploadStoreysDialog({
  units: initialUnits,
  onClose,
  onApply,
}: {
  units: DisplayUnits;
  onClose: () => void;
  onApply: (rows: StoreyRow[], mode: 'replace' | 'append') => void;
}) {
  const [units, setUnits] = useState<DisplayUnits>(initialUnits);
  const [progress, setProgress] = useState(0);
  const [decimal, setDecimal] = useState<DecimalMark | 'found'>('found');
  const [lastFile, setLastFile] = useState<File | null>(null);
  const send = (file: File, mark: DecimalMark | 'found') => {
    setProgress(0);
    setLastFile(file);
    upload.mutate({ file, units, decimal: mark === 'found' ? undefined : mark });
  };
  const upload = useImportStoreys(setProgress);
  const outcome = upload.data;
  const cell = (quantity: Quantity, value: number | null) =>
    value === null ? null : Number(toDisplay(units, quantity, value).toPrecision(8));
  const rows: PreviewRow[] = (outcome?.storeys ?? []).map((s, i) => ({
    ...s,
    id: i,
    problems: (outcome?.errors ?? [])
      .filter((e) => e.row === i + 2)
      .map((e) => `${e.column}: ${e.message}`)
      .join('; '),
  }));
  const numeric = (field: 'height' | 'mass' | 'stiffness', quantity: Quantity, header: string) =>
    ({
      field,
      headerName: header,
      type: 'number',
      flex: 1,
      valueGetter: (_v, row) => cell(quantity, row[field]),
    }) satisfies GridColDef<PreviewRow>;
  const columns: GridColDef<PreviewRow>[] = [
    { field: 'id', headerName: 'Storey', width: 80, valueGetter: (_v, row) => row.id + 1 },
    { field: 'label', headerName: 'Label', flex: 1 },
    numeric('height', 'length', `Height (${unitLabel(units, 'length')})`),
    numeric('mass', 'mass', massHeader(units)),
    numeric('stiffness', 'stiffness', `Stiffness (${unitLabel(units, 'stiffness')})`),
    { field: 'problems', headerName: 'Problems', flex: 2 },
  ];
  const apply = (mode: 'replace' | 'append') =>
    onApply(
      (outcome?.storeys ?? []).map((s) => ({
        id: newRowId(),
        label: s.label,
        height: s.height ?? Number.NaN,
        mass: s.mass ?? Number.NaN,
        stiffness: s.stiffness ?? Number.NaN,
      })),
      mode,
    );
  const fileProblems = outcome && outcome.storeys.length === 0 ? outcome.messages : [];

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="lg" aria-labelledby="upload-storeys-title">
      <DialogTitle id="upload-storeys-title">Upload a storey table</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 1 }}>
          <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
            <TextField
              select
              size="small"
              label="Units in the file"
              value={units}
              onChange={(e) => setUnits(e.target.value as DisplayUnits)}
              sx={{ minWidth: 260 }}
            >
              <MenuItem value="SI">SI: m, t, kN/m</MenuItem>
              <MenuItem value="US">US: ft, kip of seismic weight, kip/in</MenuItem>
            </TextField>
            <TextField
              select
              size="small"
              label="Numbers in the file"
              value={decimal}
              onChange={(e) => {
                const mark = e.target.value as DecimalMark | 'found';
                setDecimal(mark);
                if (lastFile) send(lastFile, mark);
              }}
              sx={{ minWidth: 240 }}
            >
              <MenuItem value="found">As found in the file</MenuItem>
              <MenuItem value="point">{DECIMAL_MARK_WORDS.point}</MenuItem>
              <MenuItem value="comma">{DECIMAL_MARK_WORDS.comma}</MenuItem>
            </TextField>
            <Typography variant="body2">
              Templates:{' '}
              <Link component="button" type="button" onClick={() => void download('xlsx', units)}>
                XLSX
              </Link>{' '}
              ·{' '}
              <Link component="button" type="button" onClick={() => void download('csv', units)}>
                CSV
              </Link>
            </Typography>
          </Stack>
          <FileDrop
            accept={ACCEPT}
            inputLabel="Storey table file"
            kinds=".csv or .xlsx"
            icon={<UploadFileIcon />}
            uploading={upload.isPending}
            progress={progress}
            onFile={(file) => send(file, decimal)}
          >
            Drop a CSV or XLSX file here, or click to choose one (at most 2 MB). Storey 1, at the
            base, is the first row under the headers.
          </FileDrop>
          {upload.isError && (
            <Alert severity="error">{errorMessages(upload.error).join(' ')}</Alert>
          )}
          {fileProblems.length > 0 && (
            <Alert severity="error" role="alert">
              {fileProblems.map((m) => (
                <div key={m}>{m}</div>
              ))}
            </Alert>
          )}
          {outcome?.readAs && (
            <Typography data-testid="read-as">
              Read as:{' '}
              {outcome.readAs.delimiter
                ? `columns separated by ${DELIMITER_WORDS[outcome.readAs.delimiter]}, `
                : 'a workbook, '}
              {outcome.readAs.decimal
                ? DECIMAL_MARK_WORDS[outcome.readAs.decimal]
                : 'decimal mark not settled by any cell'}
              .
            </Typography>
          )}
          {outcome && outcome.storeys.length > 0 && (
            <>
              {outcome.errors.length > 0 ? (
                <Alert severity="warning" role="alert" aria-label="Problems in the file">
                  {outcome.errors.length} problem(s): the cells named below arrive empty and
                  flagged; fix them in the grid or in the file.
                  {outcome.messages.map((m) => (
                    <div key={m}>{m}</div>
                  ))}
                </Alert>
              ) : (
                <Alert severity="success">
                  {outcome.storeys.length} storeys read, no problems.
                </Alert>
              )}
              <Box sx={{ height: Math.min(380, 110 + rows.length * 52) }}>
                <DataGrid
                  aria-label="Uploaded storeys"
                  rows={rows}
                  columns={columns}
                  density="compact"
                  disableColumnMenu
                  hideFooter={rows.length <= 100}
                />
              </Box>
            </>
          )}
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button disabled={!outcome?.storeys.length} onClick={() => apply('append')}>
          Append to the table
        </Button>
        <Button
          variant="contained"
          disabled={!outcome?.storeys.length}
          onClick={() => apply('replace')}
        >
          Replace the table
        </Button>
      </DialogActions>
    </Dialog>
  );
}
