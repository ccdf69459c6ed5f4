import DeleteIcon from '@mui/icons-material/Delete';
import { Box, Button, MenuItem, Stack, TextField, Typography } from '@mui/material';
import { DataGrid, GridActionsCellItem, type GridColDef } from '@mui/x-data-grid';
import type { SpectrumInput, SpectrumInterpolation } from '@tiermode/shared-types';
import { SpectrumChart } from './spectrum-chart';
import { SpectrumGeneratorForm } from './spectrum-generator-form';
import { SpectrumUpload } from './spectrum-upload';

interface SpectrumEditorProps {
  spectrum: SpectrumInput;
  modes: { number: number; period: number; sa: number }[];
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
  const pointColumns: GridColDef<PointRow>[] = [
    {
      field: 'period',
      headerName: 'Period T (s)',
      type: 'number',
      editable: !readOnly,
      flex: 1,
    },
    { field: 'sa', headerName: 'Sa (g)', type: 'number', editable: !readOnly, flex: 1 },
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
        onClick={() => setPoints(spectrum.points.filter((_, i) => i !== row.id))}
      />,
    ],
  };
  const columns = readOnly ? pointColumns : [...pointColumns, deleteColumn];
  return (
    <Stack spacing={2}>
      {!readOnly && (
        <SpectrumGeneratorForm
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
          <Box sx={{ height: 300 }}>
            <DataGrid
              aria-label="Spectrum points"
              rows={rows}
              columns={columns}
              density="compact"
              disableColumnMenu
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
          {generator && (
            <Typography variant="caption" data-testid="spectrum-source">
              Generated ({generator.kind}):{' '}
              {Object.entries(generator.parameters)
                .map(([name, value]) => `${name} ${String(value)}`)
                .join(', ')}
              . Past the table's end the generator's own formula gives Sa.
            </Typography>
          )}
          <Typography variant="caption" color="text.secondary">
            Periods must increase down the table. Outside a typed or edited table the nearest end
            value is used, with a warning.
          </Typography>
        </Stack>
        <Box sx={{ flex: 1, minWidth: 0 }}>
          <SpectrumChart spectrum={spectrum} modes={modes} />
        </Box>
      </Stack>
    </Stack>
  );
}
