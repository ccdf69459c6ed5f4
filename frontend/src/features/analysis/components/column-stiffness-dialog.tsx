import AddIcon from '@mui/icons-material/Add';
import DeleteIcon from '@mui/icons-material/Delete';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  IconButton,
  MenuItem,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import type { ColumnFixity } from '@tiermode/shared-types';
import { useState } from 'react';
import { errorMessages } from '@/lib/api-client';
import { formatNumber, fromDisplay, toDisplay, unitLabel, type UnitSystem } from '@/lib/units';
import { useColumnStiffness } from '../api/column-stiffness';

interface Group {
  modulus: string;
  secondMoment: string;
  count: string;
  fixity: ColumnFixity;
}

interface Props {
  storeyNumber: number;
  /** m */
  height: number;
  units: UnitSystem;
  onClose: () => void;
  /** N/m */
  onApply: (stiffness: number) => void;
}

/** k = sum of c E I / h^3 over the storey's column groups, computed by the server's engine. */
export function ColumnStiffnessDialog({ storeyNumber, height, units, onClose, onApply }: Props) {
  const compute = useColumnStiffness();
  const [groups, setGroups] = useState<Group[]>([
    {
      modulus: units === 'SI' ? '30' : '4350',
      secondMoment: '',
      count: '4',
      fixity: 'fixed-fixed',
    },
  ]);
  const set = (i: number, change: Partial<Group>) =>
    setGroups(groups.map((g, j) => (j === i ? { ...g, ...change } : g)));
  const run = () =>
    compute.mutate({
      height,
      columns: groups.map((g) => ({
        elasticModulus: fromDisplay(units, 'modulus', Number(g.modulus)),
        secondMoment: fromDisplay(units, 'secondMoment', Number(g.secondMoment)),
        count: Number(g.count),
        fixity: g.fixity,
      })),
    });
  const stiffnessLabel = unitLabel(units, 'stiffness');
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="md" aria-labelledby="columns-title">
      <DialogTitle id="columns-title">
        Stiffness of storey {storeyNumber} from its columns
      </DialogTitle>
      <DialogContent>
        <Typography sx={{ mb: 2 }}>
          k = Σ c E I / h³ with h = {formatNumber(toDisplay(units, 'length', height))}{' '}
          {unitLabel(units, 'length')}; c = 12 for a column fixed against rotation at both ends, 3
          with one end pinned. The fixity is your judgement of the frame; floors are taken as rigid.
        </Typography>
        <Stack spacing={1.5}>
          {groups.map((g, i) => (
            <Stack key={i} direction="row" spacing={1} sx={{ alignItems: 'center' }}>
              <TextField
                size="small"
                label={`E (${unitLabel(units, 'modulus')})`}
                value={g.modulus}
                onChange={(e) => set(i, { modulus: e.target.value })}
              />
              <TextField
                size="small"
                label={`I (${unitLabel(units, 'secondMoment')})`}
                value={g.secondMoment}
                onChange={(e) => set(i, { secondMoment: e.target.value })}
              />
              <TextField
                size="small"
                label="Number of columns"
                value={g.count}
                onChange={(e) => set(i, { count: e.target.value })}
                sx={{ width: 150 }}
              />
              <TextField
                select
                size="small"
                label="End fixity"
                value={g.fixity}
                onChange={(e) => set(i, { fixity: e.target.value as ColumnFixity })}
                sx={{ width: 240 }}
              >
                <MenuItem value="fixed-fixed">Both ends fixed (c = 12)</MenuItem>
                <MenuItem value="fixed-pinned">One end pinned (c = 3)</MenuItem>
              </TextField>
              <IconButton
                aria-label={`Remove column group ${i + 1}`}
                disabled={groups.length === 1}
                onClick={() => setGroups(groups.filter((_, j) => j !== i))}
              >
                <DeleteIcon />
              </IconButton>
            </Stack>
          ))}
          <div>
            <Button
              startIcon={<AddIcon />}
              onClick={() => setGroups([...groups, { ...groups[groups.length - 1] }])}
            >
              Add a column group
            </Button>
          </div>
          {compute.isError && (
            <Alert severity="error" role="alert">
              {errorMessages(compute.error).map((m) => (
                <div key={m}>{m}</div>
              ))}
            </Alert>
          )}
          {compute.data && (
            <Alert severity="success" role="status">
              k = {formatNumber(toDisplay(units, 'stiffness', compute.data.stiffness))}{' '}
              {stiffnessLabel} (
              {compute.data.contributions
                .map((c) => formatNumber(toDisplay(units, 'stiffness', c)))
                .join(' + ')}
              )
            </Alert>
          )}
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button onClick={run} disabled={compute.isPending}>
          Compute
        </Button>
        <Button
          variant="contained"
          disabled={!compute.data}
          onClick={() => compute.data && onApply(compute.data.stiffness)}
        >
          Use this stiffness
        </Button>
      </DialogActions>
    </Dialog>
  );
}
