import UploadFileIcon from '@mui/icons-material/UploadFile';
import { Alert, Button, MenuItem, Stack, TextField, Typography } from '@mui/material';
import {
  DECIMAL_MARK_WORDS,
  DELIMITER_WORDS,
  type DecimalMark,
  type SpectrumPointInput,
} from '@tiermode/shared-types';
import { useRef, useState } from 'react';
import { errorMessages } from '@/lib/api-client';
import { useImportSpectrum } from '../api/import-spectrum';

/** Replaces the spectrum's points with those of a CSV (or XLSX) of "Period (s)" and "Sa (g)". */
export function SpectrumUpload({ onPoints }: { onPoints: (points: SpectrumPointInput[]) => void }) {
  const input = useRef<HTMLInputElement>(null);
  const upload = useImportSpectrum();
  const [decimal, setDecimal] = useState<DecimalMark | 'found'>('found');
  const readAs = upload.data?.readAs;
  return (
    <Stack spacing={1}>
      <TextField
        select
        size="small"
        label="Numbers in the file"
        value={decimal}
        onChange={(e) => setDecimal(e.target.value as DecimalMark | 'found')}
      >
        <MenuItem value="found">As found in the file</MenuItem>
        <MenuItem value="point">{DECIMAL_MARK_WORDS.point}</MenuItem>
        <MenuItem value="comma">{DECIMAL_MARK_WORDS.comma}</MenuItem>
      </TextField>
      <Button startIcon={<UploadFileIcon />} onClick={() => input.current?.click()}>
        Upload points (CSV)
      </Button>
      <input
        ref={input}
        type="file"
        hidden
        accept=".csv,.xlsx,text/csv"
        aria-label="Spectrum file"
        onChange={(e) => {
          const file = e.target.files?.[0];
          e.target.value = '';
          if (file) {
            upload.mutate(
              { file, decimal: decimal === 'found' ? undefined : decimal },
              { onSuccess: ({ points }) => onPoints(points) },
            );
          }
        }}
      />
      {readAs && upload.isSuccess && (
        <Typography variant="caption" data-testid="spectrum-read-as">
          Read as:{' '}
          {readAs.delimiter
            ? `columns separated by ${DELIMITER_WORDS[readAs.delimiter]}, `
            : 'a workbook, '}
          {readAs.decimal ? DECIMAL_MARK_WORDS[readAs.decimal] : 'no decimal mark needed'}.
        </Typography>
      )}
      {upload.isError && (
        <Alert severity="error" role="alert" aria-label="Spectrum file problems">
          {errorMessages(upload.error).map((m) => (
            <div key={m}>{m}</div>
          ))}
        </Alert>
      )}
    </Stack>
  );
}
