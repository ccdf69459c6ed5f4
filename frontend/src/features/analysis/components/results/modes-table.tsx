import { ScrollFrame } from '@/components/data-display/scroll-frame';
import { Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { shapeNormalisationNote, type ModeSummary } from '@tiermode/shared-types';
import { formatNumber } from '@/lib/units';

/** Periods, frequencies, participation and effective masses, one mode a row. */
export function ModesTable({ modes }: { modes: ModeSummary[] }) {
  return (
    <ScrollFrame label="Modes, scrolling">
      <Table size="small" aria-label="Modes">
        <TableHead>
          <TableRow>
            <TableCell>Mode</TableCell>
            <TableCell align="right">Period (s)</TableCell>
            <TableCell align="right">Frequency (Hz)</TableCell>
            <TableCell align="right">Participation factor Γ (roof = 1 unless noted)</TableCell>
            <TableCell align="right">Effective modal mass (%)</TableCell>
            <TableCell align="right">Cumulative mass ratio (%)</TableCell>
            <TableCell align="right">Sa (g)</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {modes.map((m) => (
            <TableRow key={m.number}>
              <TableCell>{m.number}</TableCell>
              <TableCell align="right">{m.period.toFixed(4)}</TableCell>
              <TableCell align="right">{m.frequency.toFixed(3)}</TableCell>
              <TableCell align="right">
                {formatNumber(m.participationFactor)}
                {shapeNormalisationNote(m) && (
                  <Typography variant="caption" sx={{ display: 'block', color: 'warning.main' }}>
                    {shapeNormalisationNote(m)}
                  </Typography>
                )}
              </TableCell>
              <TableCell align="right">{(m.effectiveMassRatio * 100).toFixed(2)}</TableCell>
              <TableCell align="right">{(m.cumulativeMassRatio * 100).toFixed(2)}</TableCell>
              <TableCell align="right">{m.sa.toFixed(4)}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </ScrollFrame>
  );
}
