import FileOpenIcon from '@mui/icons-material/FileOpen';
import { Alert, Button, Stack } from '@mui/material';
import type { CalculationDto } from '@tiermode/shared-types';
import { useRef, useState } from 'react';
import { errorMessages } from '@/lib/api-client';
import { useImportCalculation } from '../api/calculations';

/** Reads a calc exported as JSON into a new draft of this project. */
export function ImportCalculationButton({
  projectId,
  onImported,
}: {
  projectId: string;
  onImported: (calc: CalculationDto) => void;
}) {
  const input = useRef<HTMLInputElement>(null);
  const importCalc = useImportCalculation(projectId);
  const [unreadable, setUnreadable] = useState<string | null>(null);
  const read = async (file: File) => {
    setUnreadable(null);
    let document: unknown;
    try {
      document = JSON.parse(await file.text());
    } catch {
      setUnreadable(
        `${file.name} is not a JSON file: choose one saved with Download, Whole calc (JSON)`,
      );
      return;
    }
    importCalc.mutate(document, { onSuccess: onImported });
  };
  return (
    <Stack spacing={1}>
      <Button startIcon={<FileOpenIcon />} onClick={() => input.current?.click()}>
        Import a calc (JSON)
      </Button>
      <input
        ref={input}
        type="file"
        accept="application/json,.json"
        hidden
        aria-label="Calc file (JSON)"
        onChange={(e) => {
          const file = e.target.files?.[0];
          e.target.value = '';
          if (file) void read(file);
        }}
      />
      {(unreadable || importCalc.isError) && (
        <Alert severity="error" role="alert">
          {unreadable ?? errorMessages(importCalc.error).join(' ')}
        </Alert>
      )}
    </Stack>
  );
}
