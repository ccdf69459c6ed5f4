import { Alert, Box, LinearProgress, Typography } from '@mui/material';
import type { ReactNode } from 'react';
import { useDropzone, type Accept } from 'react-dropzone';

/**
 * One file, dropped or chosen (react-dropzone), with the upload's progress and a message when the
 * file is not of an accepted kind. The server judges the content again; this only guides.
 */
export function FileDrop({
  accept,
  inputLabel,
  kinds,
  icon,
  children,
  disabled = false,
  uploading,
  progress,
  onFile,
}: {
  accept: Accept;
  /** The accessible name of the file input. */
  inputLabel: string;
  /** The accepted endings in words, for the refusal message. */
  kinds: string;
  icon: ReactNode;
  children: ReactNode;
  disabled?: boolean;
  uploading: boolean;
  /** 0..1 while uploading. */
  progress: number;
  onFile: (file: File) => void;
}) {
  const { getRootProps, getInputProps, isDragActive, fileRejections } = useDropzone({
    accept,
    maxFiles: 1,
    multiple: false,
    disabled,
    onDropAccepted: ([file]) => onFile(file),
  });
  return (
    <>
      {!disabled && (
        <Box
          {...getRootProps()}
          sx={{
            border: '2px dashed',
            borderColor: isDragActive ? 'primary.main' : 'divider',
            borderRadius: 1,
            p: 2,
            textAlign: 'center',
            cursor: 'pointer',
            bgcolor: isDragActive ? 'action.hover' : undefined,
          }}
        >
          <input {...getInputProps()} aria-label={inputLabel} />
          {icon}
          <Typography variant="body2">{children}</Typography>
        </Box>
      )}
      {uploading && (
        <LinearProgress
          variant={progress > 0 && progress < 1 ? 'determinate' : 'indeterminate'}
          value={progress * 100}
          aria-label="Uploading"
        />
      )}
      {fileRejections.length > 0 && (
        <Alert severity="error">Choose one file ending in {kinds}.</Alert>
      )}
    </>
  );
}
