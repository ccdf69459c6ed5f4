import DownloadIcon from '@mui/icons-material/Download';
import { Alert, Button, Menu, MenuItem, Snackbar } from '@mui/material';
import type { CalculationDto } from '@tiermode/shared-types';
import { useState } from 'react';
import { errorMessages } from '@/lib/api-client';
import { downloadFile } from '@/lib/download';
import type { UnitSystem } from '@/lib/units';

const withUnits = (path: string, units: UnitSystem) =>
  `${path}${path.includes('?') ? '&' : '?'}units=${units}`;

const base = (calc: CalculationDto) =>
  `${calc.title.replace(/[^A-Za-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'calculation'}-rev${calc.revision}`;

/**
 * The calc's package and results as files, in the units shown on screen, and the whole calc as
 * JSON (always SI, as the API keeps it).
 */
export function DownloadsMenu({ calc, units }: { calc: CalculationDto; units: UnitSystem }) {
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const analysed = calc.analysis !== null;
  const designValues = analysed && calc.checks?.design !== undefined && !calc.analysisStale;
  const historyPeaks = analysed && calc.hasHistoryResults && !calc.analysisStale;
  const items: {
    label: string;
    path: string;
    file: string;
    needsResults: boolean;
    hidden?: boolean;
  }[] = [
    {
      label: 'Calc package (PDF)',
      path: 'report.pdf',
      file: 'calc-package.pdf',
      needsResults: false,
    },
    { label: 'Results (XLSX)', path: 'results.xlsx', file: 'results.xlsx', needsResults: true },
    {
      label: 'Modes (CSV)',
      path: 'results.csv?table=modes',
      file: 'modes.csv',
      needsResults: true,
    },
    {
      label: 'Modal responses (CSV)',
      path: 'results.csv?table=modal',
      file: 'modal.csv',
      needsResults: true,
    },
    {
      label: 'Combined responses (CSV)',
      path: 'results.csv?table=combined',
      file: 'combined.csv',
      needsResults: true,
    },
    {
      label: 'Design storey values (CSV)',
      path: 'results.csv?table=design',
      file: 'design.csv',
      needsResults: true,
      hidden: !designValues,
    },
    {
      label: 'Response history peaks (CSV)',
      path: 'results.csv?table=history',
      file: 'history.csv',
      needsResults: true,
      hidden: !historyPeaks,
    },
    { label: 'Whole calc (JSON)', path: 'export.json', file: 'calc.json', needsResults: false },
  ];
  return (
    <>
      <Button
        startIcon={<DownloadIcon />}
        variant="outlined"
        aria-haspopup="menu"
        onClick={(e) => setAnchor(e.currentTarget)}
      >
        Download
      </Button>
      <Menu open={anchor !== null} anchorEl={anchor} onClose={() => setAnchor(null)}>
        {items
          .filter((item) => !item.hidden)
          .map((item) => (
            <MenuItem
              key={item.label}
              disabled={item.needsResults && !analysed}
              onClick={() => {
                setAnchor(null);
                const path = item.path === 'export.json' ? item.path : withUnits(item.path, units);
                downloadFile(
                  `/calculations/${calc.id}/${path}`,
                  `${base(calc)}-${item.file}`,
                ).catch((error: unknown) => setFailure(errorMessages(error).join(' ')));
              }}
            >
              {item.label}
            </MenuItem>
          ))}
      </Menu>
      <Snackbar open={failure !== null} autoHideDuration={8000} onClose={() => setFailure(null)}>
        <Alert severity="error" onClose={() => setFailure(null)}>
          {failure}
        </Alert>
      </Snackbar>
    </>
  );
}
