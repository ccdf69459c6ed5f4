import { ScrollFrame } from '@/components/data-display/scroll-frame';
import { Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import type { AnalysisSummary } from '@tiermode/shared-types';
import { useInView } from 'react-intersection-observer';
import { useWholeAnalysis, type ModalDetailSource } from '../../api/modal-detail';
import { DetailStatus } from './detail-status';

/** The correlation table of a summary's analysis, fetched once it scrolls near the screen. */
export function FetchedCorrelationTable({
  result,
  detail,
}: {
  result: AnalysisSummary;
  detail: ModalDetailSource;
}) {
  const { ref, inView } = useInView({ triggerOnce: true, rootMargin: '400px 0px' });
  const { whole, loading, error } = useWholeAnalysis(result, detail, inView);
  return (
    <div ref={ref}>
      {whole ? (
        <CorrelationTable correlation={whole.correlation} />
      ) : (
        <DetailStatus loading={loading} error={error} />
      )}
    </div>
  );
}

/** The CQC correlation coefficients rho_ij, shaded by size; shown for up to 12 modes. */
export function CorrelationTable({ correlation }: { correlation: number[][] }) {
  const n = Math.min(correlation.length, 12);
  return (
    <>
      <ScrollFrame label="Correlation coefficients, scrolling">
        <Table size="small" aria-label="Correlation coefficients">
          <TableHead>
            <TableRow>
              <TableCell>ρ</TableCell>
              {Array.from({ length: n }, (_, j) => (
                <TableCell key={j} align="center">
                  {j + 1}
                </TableCell>
              ))}
            </TableRow>
          </TableHead>
          <TableBody>
            {correlation.slice(0, n).map((row, i) => (
              <TableRow key={i}>
                <TableCell component="th" scope="row">
                  {i + 1}
                </TableCell>
                {row.slice(0, n).map((rho, j) => (
                  <TableCell
                    key={j}
                    align="center"
                    sx={{
                      bgcolor: `rgba(35, 70, 95, ${Math.min(1, rho) * 0.85})`,
                      color: rho > 0.45 ? '#fff' : 'text.primary',
                    }}
                  >
                    {rho.toFixed(3)}
                  </TableCell>
                ))}
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </ScrollFrame>
      {correlation.length > n && (
        <Typography variant="caption">
          The first {n} of {correlation.length} modes are shown.
        </Typography>
      )}
    </>
  );
}
