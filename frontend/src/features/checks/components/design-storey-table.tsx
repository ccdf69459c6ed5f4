import { ScrollFrame } from '@/components/data-display/scroll-frame';
import { Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import type { CombinedResponse, DesignStoreyValues, StoreyInput } from '@tiermode/shared-types';
import { formatNumber, toDisplay, unitLabel, type Quantity, type UnitSystem } from '@/lib/units';

const QUANTITIES = [
  { key: 'floorForce', title: 'Floor force', quantity: 'force' },
  { key: 'storeyShear', title: 'Storey shear', quantity: 'force' },
  { key: 'overturningMoment', title: 'Overturning moment', quantity: 'moment' },
  { key: 'displacement', title: 'Displacement', quantity: 'displacement' },
  { key: 'drift', title: 'Drift', quantity: 'displacement' },
] as const;

/**
 * The storey forces and displacements for design: the analysis's combined values beside the
 * design values (reduced by R/Ie or q and scaled as the basis asks), each column named
 * "elastic" or "design", so the member designer takes the right one.
 */
export function DesignStoreyTable({
  design,
  combined,
  combination,
  storeys,
  units,
}: {
  design: DesignStoreyValues;
  combined: CombinedResponse;
  combination: string;
  storeys: StoreyInput[];
  units: UnitSystem;
}) {
  const left = design.analysisValues === 'elastic' ? 'elastic' : 'design (analysis, q included)';
  const show = (quantity: Quantity, si: number) => formatNumber(toDisplay(units, quantity, si));
  return (
    <>
      <Typography variant="body2" sx={{ mb: 1 }}>
        {combination.toUpperCase()} values. {design.explanation} Forces x{' '}
        {formatNumber(design.forceFactor)}, displacements x{' '}
        {formatNumber(design.displacementFactor)}.
      </Typography>
      <ScrollFrame label="Design storey values, scrolling" maxHeight={480}>
        <Table size="small" stickyHeader aria-label="Design storey values">
          <TableHead>
            <TableRow>
              <TableCell rowSpan={2}>Storey</TableCell>
              {QUANTITIES.map((q) => (
                <TableCell key={q.key} colSpan={2} align="center">
                  {q.title} ({unitLabel(units, q.quantity)})
                </TableCell>
              ))}
            </TableRow>
            <TableRow>
              {QUANTITIES.flatMap((q) => [
                <TableCell key={`${q.key}-e`} align="right" sx={{ top: 37 }}>
                  {left}
                </TableCell>,
                <TableCell key={`${q.key}-d`} align="right" sx={{ top: 37 }}>
                  design
                </TableCell>,
              ])}
            </TableRow>
          </TableHead>
          <TableBody>
            {storeys.map((s, i) => (
              <TableRow key={i}>
                <TableCell>
                  {i + 1}
                  {s.label ? ` ${s.label}` : ''}
                </TableCell>
                {QUANTITIES.flatMap((q) => [
                  <TableCell key={`${q.key}-e`} align="right">
                    {show(q.quantity, combined[q.key][i])}
                  </TableCell>,
                  <TableCell key={`${q.key}-d`} align="right" sx={{ fontWeight: 500 }}>
                    {show(q.quantity, design[q.key][i])}
                  </TableCell>,
                ])}
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </ScrollFrame>
    </>
  );
}
