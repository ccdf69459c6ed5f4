import { formatDate } from '@tiermode/shared-types';
import { Alert, Box } from '@mui/material';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import type { CalculationListQuery, CalculationSummaryDto } from '@tiermode/shared-types';
import { calcColumns } from '@/components/data-display/calc-columns';
import { errorMessages } from '@/lib/api-client';
import { useCalculations } from '../api/calculations';

const date = (value: string | null) => formatDate(value, '');

const columns: GridColDef<CalculationSummaryDto>[] = [
  ...calcColumns<CalculationSummaryDto>(),
  {
    field: 'author',
    headerName: 'Author',
    width: 130,
    valueGetter: (_v, row) => row.author.name,
  },
  {
    field: 'reviewer',
    headerName: 'Reviewer',
    width: 130,
    valueGetter: (_v, row) => row.reviewer?.name ?? '',
  },
  {
    field: 'updatedAt',
    headerName: 'Last change',
    width: 110,
    valueFormatter: (value: string) => date(value),
  },
];

/** Calcs the caller may read, as the query picks them; each title opens the calc. */
export function CalculationList({
  query,
  label,
  hideProject = false,
  empty,
}: {
  query: CalculationListQuery;
  label: string;
  hideProject?: boolean;
  empty: string;
}) {
  const calcs = useCalculations(query);
  if (calcs.isError) return <Alert severity="error">{errorMessages(calcs.error).join(' ')}</Alert>;
  const rows = calcs.data ?? [];
  return (
    <Box sx={{ height: rows.length === 0 ? 160 : Math.min(420, 110 + rows.length * 52) }}>
      <DataGrid
        aria-label={label}
        rows={rows}
        columns={columns}
        loading={calcs.isPending}
        // A column empty in every row gives its room to the titles.
        columnVisibilityModel={{
          projectName: !hideProject,
          reviewer: rows.some((r) => r.reviewer !== null),
        }}
        disableRowSelectionOnClick
        hideFooter={rows.length <= 100}
        localeText={{ noRowsLabel: empty }}
      />
    </Box>
  );
}
