import { Alert, Box, MenuItem, Stack, TextField, Typography } from '@mui/material';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import {
  CODE_BASES,
  CODE_BASIS_LABELS,
  type CodeBasis,
  formatDate,
  type LibraryEntryDto,
} from '@tiermode/shared-types';
import { useMemo, useState } from 'react';
import { CautionBanner } from '@/components/feedback/caution-banner';
import { calcColumns } from '@/components/data-display/calc-columns';
import { errorMessages } from '@/lib/api-client';
import { useLibrary } from '../api/library';

const columns: GridColDef<LibraryEntryDto>[] = [
  ...calcColumns<LibraryEntryDto>(),
  {
    field: 'buildingHeight',
    headerName: 'Height (m)',
    type: 'number',
    width: 110,
    valueFormatter: (value: number) => value.toFixed(1),
  },
  { field: 'structuralSystem', headerName: 'Structural system', flex: 1, minWidth: 170 },
  {
    field: 'codeBasis',
    headerName: 'Code basis',
    width: 140,
    valueFormatter: (value: CodeBasis) => CODE_BASIS_LABELS[value],
  },
  { field: 'reviewerName', headerName: 'Accepted by', width: 150 },
  {
    field: 'lockedAt',
    headerName: 'Locked',
    width: 120,
    valueFormatter: (value: string) => formatDate(value),
  },
];

const ANY = '';

/** The calcs of record, to learn from: filter by height, system and code basis, open one to read. */
export function LibraryPage() {
  const library = useLibrary();
  const [minHeight, setMinHeight] = useState('');
  const [maxHeight, setMaxHeight] = useState('');
  const [system, setSystem] = useState(ANY);
  const [basis, setBasis] = useState<CodeBasis | typeof ANY>(ANY);
  const entries = useMemo(() => library.data ?? [], [library.data]);
  const systems = [...new Set(entries.map((e) => e.structuralSystem).filter(Boolean))] as string[];
  const min = minHeight.trim() === '' ? -Infinity : Number(minHeight);
  const max = maxHeight.trim() === '' ? Infinity : Number(maxHeight);
  const heightProblem =
    Number.isNaN(min) || Number.isNaN(max)
      ? 'Heights must be numbers in metres'
      : min > max
        ? 'The lowest height must not be above the highest'
        : null;
  const rows = heightProblem
    ? entries
    : entries.filter(
        (e) =>
          e.buildingHeight >= min &&
          e.buildingHeight <= max &&
          (system === ANY || e.structuralSystem === system) &&
          (basis === ANY || e.codeBasis === basis),
      );
  return (
    <Stack spacing={2}>
      <Typography variant="h1">Library</Typography>
      <Typography color="text.secondary">
        Locked calcs of record, and the superseded revisions before them. Each opens read-only, with
        its seal and every step of the method.
      </Typography>
      <CautionBanner />
      <Stack direction={{ xs: 'column', md: 'row' }} spacing={2} role="search" aria-label="Filters">
        <TextField
          size="small"
          label="Height from (m)"
          value={minHeight}
          onChange={(e) => setMinHeight(e.target.value)}
          error={Boolean(heightProblem)}
          helperText={heightProblem ?? ' '}
          slotProps={{ htmlInput: { inputMode: 'decimal' } }}
        />
        <TextField
          size="small"
          label="Height to (m)"
          value={maxHeight}
          onChange={(e) => setMaxHeight(e.target.value)}
          error={Boolean(heightProblem)}
          helperText=" "
          slotProps={{ htmlInput: { inputMode: 'decimal' } }}
        />
        <TextField
          select
          size="small"
          label="Structural system"
          value={system}
          onChange={(e) => setSystem(e.target.value)}
          sx={{ minWidth: 220 }}
        >
          <MenuItem value={ANY}>Any system</MenuItem>
          {systems.map((s) => (
            <MenuItem key={s} value={s}>
              {s}
            </MenuItem>
          ))}
        </TextField>
        <TextField
          select
          size="small"
          label="Code basis"
          value={basis}
          onChange={(e) => setBasis(e.target.value as CodeBasis)}
          sx={{ minWidth: 200 }}
        >
          <MenuItem value={ANY}>Any code basis</MenuItem>
          {CODE_BASES.map((c) => (
            <MenuItem key={c} value={c}>
              {CODE_BASIS_LABELS[c]}
            </MenuItem>
          ))}
        </TextField>
      </Stack>
      {library.isError && <Alert severity="error">{errorMessages(library.error).join(' ')}</Alert>}
      <Box sx={{ height: Math.min(560, 160 + rows.length * 52) }}>
        <DataGrid
          aria-label="Library"
          rows={rows}
          columns={columns}
          loading={library.isPending}
          disableRowSelectionOnClick
          localeText={{ noRowsLabel: 'No calc of record matches these filters' }}
        />
      </Box>
    </Stack>
  );
}
