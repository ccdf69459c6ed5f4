import DeleteIcon from '@mui/icons-material/Delete';
import { Alert, Box, Button, MenuItem, Stack, TextField, Typography } from '@mui/material';
import { DataGrid, GridActionsCellItem, type GridColDef } from '@mui/x-data-grid';
import {
  describeSpectrumSource,
  spectrumPointProblems,
  type SpectrumInput,
  type SpectrumInterpolation,
} from '@tiermode/shared-types';
import { SPECTRUM_LIMITS } from '../model/use-analysis-inputs';
import { SpectrumChart } from './spectrum-chart';
import { SpectrumGeneratorForm } from './spectrum-generator-form';
import { SpectrumUpload } from './spectrum-upload';

interface SpectrumEditorProps {
  spectrum: SpectrumInput;
  modes: { number: number; period: number }[];
  onChange: (spectrum: SpectrumInput) => void;
  /** Shown, not edited. */
  readOnly?: boolean;
}

type PointRow = { id: number; period: number; sa: number };

/** The design spectrum: its point table, a generator that fills it, and its plot. */
export function SpectrumEditor({
  spectrum,
  modes,
  onChange,
  readOnly = false,
}: SpectrumEditorProps) {
  const rows: PointRow[] = spectrum.points.map((p, id) => ({ id, ...p }));
  // Any change to the points makes the table the engineer's own: past its end the last value is
  // used then, not the generator's formula.
  const setPoints = (points: SpectrumInput['points']) =>
    onChange({ ...spectrum, points, source: { kind: 'user' } });
  const generator = spectrum.source && spectrum.source.kind !== 'user' ? spectrum.source : null;
  const problems = spectrumPointProblems(spectrum.points, SPECTRUM_LIMITS);
  const invalid = new Set(problems.map((p) => `${p.index}:${p.field}`));
  const marked = (field: 'period' | 'sa') => ({
    cellClassName: (params: { row: PointRow }) =>
      invalid.has(`${params.row.id}:${field}`) ? 'cell-invalid' : '',
  });
  const pointColumns: GridColDef<PointRow>[] = [
    {
      field: 'period',
      headerName: 'Period T (s)',
      type: 'number',
      editable: !readOnly,
      flex: 1,
      ...marked('period'),
    },
    {
      field: 'sa',
      headerName: 'Sa (g)',
      type: 'number',
      editable: !readOnly,
      flex: 1,
      ...marked('sa'),
    },
  ];
  const deleteColumn: GridColDef<PointRow> = {
    field: 'actions',
    type: 'actions',
    width: 60,
    getActions: ({ row }) => [
      <GridActionsCellItem
        key="delete"
        icon={<DeleteIcon />}
        label={`Delete point ${row.id + 1}`}
        title={`Delete point ${row.id + 1}`}
        onClick={() => setPoints(spectrum.points.filter((_, i) => i !== row.id))}
      />,
    ],
  };
  const columns = readOnly ? pointColumns : [...pointColumns, deleteColumn];
  return (
    <Stack spacing={2}>
      {!readOnly && (
        <SpectrumGeneratorForm
          source={spectrum.source}
          onGenerated={(g) =>
            onChange({ points: g.points, interpolation: g.interpolation, source: g.source })
          }
        />
      )}
      <Stack direction={{ xs: 'column', lg: 'row' }} spacing={2}>
        <Stack spacing={1} sx={{ width: { lg: 320 } }}>
          <TextField
            select
            size="small"
            label="Interpolation"
            value={spectrum.interpolation ?? 'linear'}
            disabled={readOnly}
            onChange={(e) =>
              onChange({ ...spectrum, interpolation: e.target.value as SpectrumInterpolation })
            }
          >
            <MenuItem value="linear">Linear in T</MenuItem>
            <MenuItem value="log-log">Log-log</MenuItem>
          </TextField>
          <Box
            sx={{
              height: 300,
              '& .cell-invalid': { bgcolor: 'error.light', color: 'error.contrastText' },
            }}
          >
            <DataGrid
              aria-label="Spectrum points"
              rows={rows}
              columns={columns}
              density="compact"
              disableColumnMenu
              disableColumnSorting
              hideFooter={rows.length <= 100}
              processRowUpdate={(row: PointRow) => {
                setPoints(
                  spectrum.points.map((p, i) =>
                    i === row.id ? { period: Number(row.period), sa: Number(row.sa) } : p,
                  ),
                );
                return row;
              }}
            />
          </Box>
          {problems.length > 0 && (
            <Alert severity="error" role="alert" aria-label="Spectrum problems">
              {problems.map((p) => (
                <div key={`${p.index}:${p.field}`}>{p.message}</div>
              ))}
            </Alert>
          )}
          {!readOnly && <SpectrumUpload onPoints={setPoints} />}
          <Button
            sx={{ display: readOnly ? 'none' : undefined }}
            onClick={() => {
              const last = spectrum.points[spectrum.points.length - 1];
              setPoints([
                ...spectrum.points,
                { period: (last?.period ?? 0) + 1, sa: last?.sa ?? 0 },
              ]);
            }}
          >
            Add a point
          </Button>
          <Typography variant="body2" data-testid="spectrum-source">
            Source: {describeSpectrumSource(spectrum.source)}.
            {generator
              ? " Past the table's end the generator's own formula gives Sa."
              : ' Past its end the last value is used, with a warning.'}
          </Typography>
          <Typography variant="caption" color="text.secondary">
            Periods must increase down the table.
          </Typography>
        </Stack>
        <Box sx={{ flex: 1, minWidth: 0 }}>
          <SpectrumChart spectrum={spectrum} modes={modes} />
        </Box>
      </Stack>
    </Stack>
  );
}
