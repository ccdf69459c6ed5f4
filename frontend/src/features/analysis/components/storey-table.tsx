import AddIcon from '@mui/icons-material/Add';
import ContentPasteIcon from '@mui/icons-material/ContentPaste';
import UploadFileIcon from '@mui/icons-material/UploadFile';
import CalculateIcon from '@mui/icons-material/Calculate';
import DeleteIcon from '@mui/icons-material/Delete';
import ContentCopyIcon from '@mui/icons-material/ContentCopy';
import CommentIcon from '@mui/icons-material/Comment';
import ReportIcon from '@mui/icons-material/Report';
import VerticalAlignBottomIcon from '@mui/icons-material/VerticalAlignBottom';
import { Alert, Box, Button, Stack, Tooltip, Typography } from '@mui/material';
import {
  DataGrid,
  GridActionsCellItem,
  gridFocusCellSelector,
  useGridApiRef,
  type GridColDef,
} from '@mui/x-data-grid';
import {
  DECIMAL_MARK_WORDS,
  detectDecimalMark,
  type PlausibilityFlag,
} from '@tiermode/shared-types';
import { useState, type ClipboardEvent } from 'react';
import {
  formatNumber,
  fromDisplay,
  massHeader,
  toDisplay,
  unitLabel,
  type Quantity,
  type UnitSystem,
} from '@/lib/units';
import {
  localeDecimalMark,
  pasteIntoTable,
  storeyBlockText,
  type StoreyField,
} from '../model/paste';
import { newRowId, storeyProblems, type StoreyRow } from '../model/storey-rows';
import { ColumnStiffnessDialog } from './column-stiffness-dialog';
import { PasteDialog } from './paste-dialog';
import { UploadStoreysDialog } from './upload-storeys-dialog';

interface StoreyTableProps {
  rows: StoreyRow[];
  units: UnitSystem;
  onChange: (rows: StoreyRow[]) => void;
  /** Shown, not edited: a locked or submitted calc, or one the reader may not change. */
  readOnly?: boolean;
  /** Implausible results of the last analysis, each marked on its storey's row. */
  flags?: PlausibilityFlag[];
  /** Open review comments tied to a storey, marked on its row: storey number -> the comments. */
  comments?: Map<number, string[]>;
}

type DisplayRow = StoreyRow & { number: number };

const toNumber = (value: unknown) =>
  typeof value === 'number' ? value : value === null || value === '' ? Number.NaN : Number(value);

/** The storey table: storey 1 (at the base) first; values shown in the chosen units. */
export function StoreyTable({
  rows,
  units,
  onChange,
  readOnly = false,
  flags = [],
  comments = new Map<number, string[]>(),
}: StoreyTableProps) {
  const apiRef = useGridApiRef();
  const [pasting, setPasting] = useState(false);
  const [gridPaste, setGridPaste] = useState<{ ok: boolean; message: string } | null>(null);
  const flagged = new Map(flags.map((f) => [f.storey, f.message]));
  const [uploading, setUploading] = useState(false);
  const [columnsFor, setColumnsFor] = useState<number | null>(null);
  const problems = storeyProblems(rows);
  const invalid = new Set(problems.map((p) => `${p.rowId}:${p.field}`));

  const numeric = (
    field: 'height' | 'mass' | 'stiffness',
    quantity: Quantity,
    header: string,
  ): GridColDef<DisplayRow> => ({
    field,
    headerName: header,
    type: 'number',
    editable: !readOnly,
    flex: 1,
    minWidth: 130,
    valueGetter: (_value, row) =>
      Number.isFinite(row[field])
        ? Number(toDisplay(units, quantity, row[field]).toPrecision(10))
        : null,
    // Six significant figures on screen (723,012 kN/m, not 723,012.267); editing, copying and
    // "Copy the table" keep every digit.
    valueFormatter: (value: number | null) => (value === null ? '' : formatNumber(value, 6)),
    valueSetter: (value, row) => {
      const shown = toNumber(value);
      return {
        ...row,
        [field]: Number.isFinite(shown) ? fromDisplay(units, quantity, shown) : Number.NaN,
      };
    },
    cellClassName: (params) => (invalid.has(`${params.row.id}:${field}`) ? 'cell-invalid' : ''),
  });

  const insertBelow = (index: number) => {
    const template = rows[index] ?? rows[rows.length - 1];
    const copy = { ...template, id: newRowId(), label: '' };
    onChange([...rows.slice(0, index), copy, ...rows.slice(index)]);
  };

  const headings = [
    'Label',
    `Height (${unitLabel(units, 'length')})`,
    massHeader(units),
    `Stiffness (${unitLabel(units, 'stiffness')})`,
  ];
  const copyTable = () => {
    const text = storeyBlockText(rows, headings, (field, value) =>
      toDisplay(units, field === 'height' ? 'length' : field, value),
    );
    void navigator.clipboard
      ?.writeText(text)
      .then(() =>
        setGridPaste({
          ok: true,
          message: `Copied ${rows.length} storey(s), every digit, with headings.`,
        }),
      )
      .catch(() =>
        setGridPaste({ ok: false, message: 'The browser did not allow copying to the clipboard.' }),
      );
  };
  // Ctrl+V on a selected cell (the grid's own clipboard paste is not in its free edition).
  const onPaste = (event: ClipboardEvent<HTMLDivElement>) => {
    if (readOnly) return;
    const target = event.target as HTMLElement;
    if (target.closest('input, textarea')) return; // a cell being edited takes the text itself
    const focus = gridFocusCellSelector(apiRef);
    const field = focus?.field as StoreyField | undefined;
    if (!focus || !field || !['label', 'height', 'mass', 'stiffness'].includes(field)) return;
    const index = rows.findIndex((r) => r.id === focus.id);
    const text = event.clipboardData.getData('text/plain');
    if (index < 0 || !text.trim()) return;
    event.preventDefault();
    const fallbackDecimal = localeDecimalMark();
    const pasted = pasteIntoTable(rows, text, { index, field }, units, { fallbackDecimal });
    if (pasted.rows) {
      onChange(pasted.rows);
      const mark = pasted.readAs.decimal;
      setGridPaste({
        ok: true,
        message: `Pasted from storey ${index + 1}, ${field}${
          mark ? `, read as ${DECIMAL_MARK_WORDS[mark]}` : ''
        }${mark && detectDecimalMark([text]) === null ? ', as the grid shows numbers' : ''}.`,
      });
    } else {
      setGridPaste({ ok: false, message: `Nothing was pasted. ${pasted.errors.join(' ')}` });
    }
  };

  const dataColumns: GridColDef<DisplayRow>[] = [
    {
      field: 'number',
      headerName: 'Storey',
      width: 80,
      type: 'number',
      sortable: false,
      renderCell: ({ row }) => {
        const said = comments.get(row.number);
        return (
          <Box component="span" sx={{ display: 'inline-flex', alignItems: 'center', gap: 0.5 }}>
            {flagged.has(row.number) && (
              <Tooltip describeChild title={flagged.get(row.number)}>
                <ReportIcon
                  fontSize="small"
                  color="error"
                  titleAccess={`Storey ${row.number}: ${flagged.get(row.number)}`}
                />
              </Tooltip>
            )}
            {said && (
              <Tooltip describeChild title={said.join(' · ')}>
                <CommentIcon
                  fontSize="small"
                  color="info"
                  titleAccess={`Storey ${row.number}: ${said.length} open comment${said.length > 1 ? 's' : ''}`}
                />
              </Tooltip>
            )}
            {row.number}
          </Box>
        );
      },
    },
    {
      field: 'label',
      headerName: 'Label',
      editable: !readOnly,
      flex: 1,
      minWidth: 110,
      sortable: false,
    },
    numeric('height', 'length', `Height (${unitLabel(units, 'length')})`),
    numeric('mass', 'mass', massHeader(units)),
    numeric('stiffness', 'stiffness', `Stiffness (${unitLabel(units, 'stiffness')})`),
  ];
  const actionColumn: GridColDef<DisplayRow> = {
    field: 'actions',
    type: 'actions',
    headerName: 'Storey actions',
    width: 140,
    getActions: ({ row }) => [
      <GridActionsCellItem
        key="columns"
        icon={<CalculateIcon />}
        label={`Stiffness of storey ${row.number} from its columns`}
        title={`Stiffness of storey ${row.number} from its columns`}
        disabled={!(row.height > 0)}
        onClick={() => setColumnsFor(row.number - 1)}
      />,
      <GridActionsCellItem
        key="insert"
        icon={<VerticalAlignBottomIcon />}
        label={`Insert a storey below storey ${row.number}`}
        title={`Insert a storey below storey ${row.number}`}
        onClick={() => insertBelow(row.number - 1)}
      />,
      <GridActionsCellItem
        key="delete"
        icon={<DeleteIcon />}
        label={`Delete storey ${row.number}`}
        title={`Delete storey ${row.number}`}
        disabled={rows.length === 1}
        onClick={() => onChange(rows.filter((r) => r.id !== row.id))}
      />,
    ],
  };
  const columns = readOnly ? dataColumns : [...dataColumns, actionColumn];

  return (
    <Stack spacing={1}>
      {!readOnly && (
        <Stack direction="row" spacing={1} useFlexGap sx={{ flexWrap: 'wrap' }}>
          <Button startIcon={<AddIcon />} onClick={() => insertBelow(rows.length)}>
            Add a storey on top
          </Button>
          <Button startIcon={<ContentPasteIcon />} onClick={() => setPasting(true)}>
            Paste from a spreadsheet
          </Button>
          <Button startIcon={<UploadFileIcon />} onClick={() => setUploading(true)}>
            Upload a CSV or XLSX file
          </Button>
          <Button startIcon={<ContentCopyIcon />} onClick={copyTable}>
            Copy the table
          </Button>
        </Stack>
      )}
      <Box
        onPaste={onPaste}
        sx={{
          height: Math.min(460, 110 + rows.length * 52),
          '& .cell-invalid': { bgcolor: 'error.light', color: 'error.contrastText' },
          '& .row-flagged': { boxShadow: (t) => `inset 4px 0 0 ${t.palette.error.main}` },
          '& .row-commented': { boxShadow: (t) => `inset 4px 0 0 ${t.palette.info.main}` },
        }}
      >
        <DataGrid
          apiRef={apiRef}
          ignoreValueFormatterDuringExport
          getRowClassName={({ row }) =>
            flagged.has(row.number)
              ? 'row-flagged'
              : comments.has(row.number)
                ? 'row-commented'
                : ''
          }
          aria-label="Storey table"
          rows={rows.map((row, i) => ({ ...row, number: i + 1 }))}
          columns={columns}
          hideFooter={rows.length <= 100}
          disableColumnMenu
          // Storey order is the building's: storey 1 at the base. A header click never reorders it.
          disableColumnSorting
          disableRowSelectionOnClick
          processRowUpdate={(updated: DisplayRow) => {
            const row: StoreyRow = {
              id: updated.id,
              label: updated.label,
              height: updated.height,
              mass: updated.mass,
              stiffness: updated.stiffness,
            };
            onChange(rows.map((r) => (r.id === row.id ? row : r)));
            return updated;
          }}
        />
      </Box>
      {gridPaste && (
        <Alert
          severity={gridPaste.ok ? 'success' : 'error'}
          role={gridPaste.ok ? 'status' : 'alert'}
          onClose={() => setGridPaste(null)}
        >
          {gridPaste.message}
        </Alert>
      )}
      <Typography variant="caption" color="text.secondary">
        Storey 1 is at the base and the roof is the last row. Each storey's mass is lumped at the
        floor on top of it; its height and stiffness are those of the storey below that floor. To
        paste cells from a spreadsheet straight in, select a cell and press Ctrl+V.
      </Typography>
      {problems.length > 0 && (
        <Alert severity="error" role="alert" aria-label="Storey table problems">
          {problems.map((p) => (
            <div key={`${p.rowId}-${p.field}`}>{p.message}</div>
          ))}
        </Alert>
      )}
      {columnsFor !== null && rows[columnsFor] && (
        <ColumnStiffnessDialog
          storeyNumber={columnsFor + 1}
          height={rows[columnsFor].height}
          units={units}
          onClose={() => setColumnsFor(null)}
          onApply={(stiffness) => {
            onChange(rows.map((r, i) => (i === columnsFor ? { ...r, stiffness } : r)));
            setColumnsFor(null);
          }}
        />
      )}
      {uploading && (
        <UploadStoreysDialog
          units={units}
          onClose={() => setUploading(false)}
          onApply={(uploaded, mode) => {
            onChange(mode === 'replace' ? uploaded : [...rows, ...uploaded]);
            setUploading(false);
          }}
        />
      )}
      {pasting && (
        <PasteDialog
          units={units}
          onClose={() => setPasting(false)}
          onApply={(pasted, mode) => {
            onChange(mode === 'replace' ? pasted : [...rows, ...pasted]);
            setPasting(false);
          }}
        />
      )}
    </Stack>
  );
}
