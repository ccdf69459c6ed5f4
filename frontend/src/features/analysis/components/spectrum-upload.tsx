import UploadFileIcon from '@mui/icons-material/UploadFile';
import { Alert, Button, Stack } from '@mui/material';
import type { SpectrumPointInput } from '@tiermode/shared-types';
import { useRef } from 'react';
import { errorMessages } from '@/lib/api-client';
import { useImportSpectrum } from '../api/import-spectrum';

/** Replaces the spectrum's points with those of a CSV (or XLSX) of "Period (s)" and "Sa (g)". */
export function SpectrumUpload({ onPoints }: { onPoints: (points: SpectrumPointInput[]) => void }) {
  const input = useRef<HTMLInputElement>(null);
  const upload = useImportSpectrum();
  return (
    <Stack spacing={1}>
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
          if (file) upload.mutate(file, { onSuccess: ({ points }) => onPoints(points) });
        }}
      />
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
