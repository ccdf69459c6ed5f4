import { Link } from '@mui/material';
import type { GridColDef, GridValidRowModel } from '@mui/x-data-grid';
import type { CalculationStatus } from '@tiermode/shared-types';
import { Link as RouterLink } from 'react-router';
import { StatusChip } from '@/components/feedback/status-chip';

interface CalcRow extends GridValidRowModel {
  id: string;
  title: string;
  projectName: string;
  revision: number;
  status: CalculationStatus;
  storeyCount: number;
  /** Lists of drafts carry these, so a returned draft says so. */
  returnedAt?: string | null;
  openComments?: number;
}

/** The columns every list of calcs starts with: title (opening the calc), project, revision, status, storeys. */
export function calcColumns<Row extends CalcRow>(): GridColDef<Row>[] {
  return [
    {
      field: 'title',
      headerName: 'Calculation',
      flex: 3,
      minWidth: 300,
      renderCell: ({ row }) => (
        <Link component={RouterLink} to={`/calculations/${row.id}`}>
          {row.title}
        </Link>
      ),
    },
    { field: 'projectName', headerName: 'Project', flex: 1.5, minWidth: 160 },
    { field: 'revision', headerName: 'Revision', type: 'number', width: 85 },
    {
      field: 'status',
      headerName: 'Status',
      width: 195,
      renderCell: ({ row }) => (
        <StatusChip
          status={row.status}
          returnedWithComments={row.returnedAt ? (row.openComments ?? 0) : null}
        />
      ),
    },
    { field: 'storeyCount', headerName: 'Storeys', type: 'number', width: 85 },
  ];
}
