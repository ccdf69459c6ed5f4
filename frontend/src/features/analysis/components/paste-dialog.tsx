import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  TextField,
  Typography,
} from '@mui/material';
import { useState } from 'react';
import { massHeader, unitLabel, type UnitSystem } from '@/lib/units';
import { parseStoreyBlock, type ReadOptions } from '../model/paste';
import type { StoreyRow } from '../model/storey-rows';
import { ReadAsControls } from './read-as-controls';

interface PasteDialogProps {
  units: UnitSystem;
  onClose: () => void;
  onApply: (rows: StoreyRow[], mode: 'replace' | 'append') => void;
}

/** Paste a block of storeys copied from a spreadsheet; rows that cannot be read are named. */
export function PasteDialog({ units, onClose, onApply }: PasteDialogProps) {
  const [text, setText] = useState('');
  const [options, setOptions] = useState<ReadOptions>({});
  const parsed = text.trim() ? parseStoreyBlock(text, units, options) : null;
  const columns = `label (optional), height (${unitLabel(units, 'length')}), ${massHeader(units).toLowerCase()}, stiffness (${unitLabel(units, 'stiffness')})`;
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="md" aria-labelledby="paste-title">
      <DialogTitle id="paste-title">Paste storeys from a spreadsheet</DialogTitle>
      <DialogContent>
        <Typography sx={{ mb: 1 }}>
          One storey a line, storey 1 (at the base) first. Columns: {columns}.
        </Typography>
        <TextField
          label="Pasted cells"
          multiline
          minRows={8}
          fullWidth
          autoFocus
          value={text}
          onChange={(e) => setText(e.target.value)}
          slotProps={{ htmlInput: { style: { fontFamily: 'monospace' } } }}
        />
        {parsed && (
          <ReadAsControls readAs={parsed.readAs} options={options} onChange={setOptions} />
        )}
        {parsed && (
          <Alert
            severity={parsed.errors.length ? 'warning' : 'success'}
            sx={{ mt: 2 }}
            role="status"
          >
            {parsed.rows.length} storey(s) read.
            {parsed.errors.map((e) => (
              <div key={e}>{e}</div>
            ))}
          </Alert>
        )}
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button
          disabled={!parsed?.rows.length}
          onClick={() => parsed && onApply(parsed.rows, 'append')}
        >
          Add on top
        </Button>
        <Button
          variant="contained"
          disabled={!parsed?.rows.length}
          onClick={() => parsed && onApply(parsed.rows, 'replace')}
        >
          Replace the table
        </Button>
      </DialogActions>
    </Dialog>
  );
}
