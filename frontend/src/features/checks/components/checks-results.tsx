import { ScrollFrame } from '@/components/data-display/scroll-frame';
import {
  Alert,
  AlertTitle,
  Box,
  Chip,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import type { AnalysisSummary, ChecksResponse, StoreyInput } from '@tiermode/shared-types';
import { DesignStoreyTable } from './design-storey-table';
import { Scatter } from 'react-chartjs-2';
import { SERIES_COLOURS, STATIC_CHART } from '@/lib/charts';
import { formatNumber, toDisplay, unitLabel, type UnitSystem } from '@/lib/units';

const PASS = (ok: boolean) => (
  <Chip size="small" color={ok ? 'success' : 'error'} label={ok ? 'OK' : 'Exceeds'} />
);

/** The checks stored with the analysis: ELF comparison, storey drifts and stability, flags. */
export function ChecksResults({
  checks,
  analysis,
  storeys,
  units,
}: {
  checks: ChecksResponse;
  /** The analysis the checks were made with, for the elastic values beside the design ones. */
  analysis: AnalysisSummary;
  storeys: StoreyInput[];
  units: UnitSystem;
}) {
  const force = (n: number) =>
    `${formatNumber(toDisplay(units, 'force', n))} ${unitLabel(units, 'force')}`;
  const levels = storeys
    .reduce<number[]>((acc, s) => [...acc, acc[acc.length - 1] + s.height], [0])
    .map((h) => toDisplay(units, 'length', h));
  const steps = checks.storeys.flatMap((s, i) => [
    { x: s.designDriftRatio, y: levels[i] },
    { x: s.designDriftRatio, y: levels[i + 1] },
  ]);
  const limit = checks.storeys.flatMap((s, i) => [
    { x: s.driftLimitRatio, y: levels[i] },
    { x: s.driftLimitRatio, y: levels[i + 1] },
  ]);
  const failing = checks.storeys.filter((s) => !s.driftOk).map((s) => s.storey);
  return (
    <Stack spacing={2}>
      {(checks.warnings ?? []).length > 0 && (
        <Alert severity="warning" role="alert" aria-label="Checks warnings">
          <AlertTitle>Check the basis before relying on these checks</AlertTitle>
          {(checks.warnings ?? []).map((w) => (
            <div key={w}>{w}</div>
          ))}
        </Alert>
      )}
      <Alert severity="info" role="note" aria-label="About the checks">
        <AlertTitle>The checks follow the named clauses as the software reads them</AlertTitle>
        The engineer of record confirms that they apply under the locally adopted code, and checks
        what the software does not: torsion, other irregularities, member design.
      </Alert>
      <Box component="section" aria-label="ELF and modal base shear">
        <Typography variant="h3" gutterBottom>
          Equivalent lateral force and modal base shear
        </Typography>
        <ScrollFrame label="Equivalent lateral force, scrolling">
          <Table size="small" sx={{ maxWidth: 720 }}>
            <TableBody>
              <TableRow>
                <TableCell>Period used for ELF</TableCell>
                <TableCell align="right">
                  {checks.elf.period.toFixed(3)} s
                  {checks.elf.capped
                    ? ` (computed ${checks.elf.computedPeriod.toFixed(3)} s, capped at Cu Ta)`
                    : ''}
                </TableCell>
              </TableRow>
              {checks.elf.csGoverns && (
                <TableRow>
                  <TableCell>Cs</TableCell>
                  <TableCell align="right">
                    {checks.elf.cs.toFixed(4)} ({checks.elf.csGoverns} governs)
                  </TableCell>
                </TableRow>
              )}
              <TableRow>
                <TableCell>ELF base shear V ({checks.elf.clause})</TableCell>
                <TableCell align="right">{force(checks.elf.baseShear)}</TableCell>
              </TableRow>
              <TableRow>
                <TableCell>Modal base shear Vt</TableCell>
                <TableCell align="right">{force(checks.modalBaseShear)}</TableCell>
              </TableRow>
              <TableRow>
                <TableCell>Scale factor for forces</TableCell>
                <TableCell align="right" aria-label="Scale factor">
                  {checks.scaleFactor.toFixed(3)}
                </TableCell>
              </TableRow>
              <TableRow>
                <TableCell>Scale factor for drifts</TableCell>
                <TableCell align="right">{checks.driftScaleFactor.toFixed(3)}</TableCell>
              </TableRow>
            </TableBody>
          </Table>
        </ScrollFrame>
      </Box>
      <Box component="section" aria-label="Storey values for design">
        <Typography variant="h3" gutterBottom>
          Storey values for design
        </Typography>
        {checks.design ? (
          <DesignStoreyTable
            design={checks.design}
            combined={analysis.combined[checks.design.combination]}
            combination={checks.design.combination}
            storeys={storeys}
            units={units}
          />
        ) : (
          <Alert severity="info">
            These checks were stored before design storey values existed: analyse again to see them.
          </Alert>
        )}
      </Box>
      <Box component="section" aria-label="Storey drift and stability">
        <Typography variant="h3" gutterBottom>
          Storey drift and stability
        </Typography>
        {failing.length > 0 ? (
          <Alert severity="error" role="alert" aria-label="Drift check">
            The design drift exceeds the limit at storey {failing.join(', ')}.
          </Alert>
        ) : (
          <Alert severity="success" aria-label="Drift check">
            Every storey's design drift is within the limit.
          </Alert>
        )}
        <ScrollFrame label="Storey checks, scrolling">
          <Table size="small" aria-label="Storey checks">
            <TableHead>
              <TableRow>
                <TableCell>Storey</TableCell>
                <TableCell align="right">Design drift / height</TableCell>
                <TableCell align="right">Limit</TableCell>
                <TableCell>Drift</TableCell>
                <TableCell align="right">Theta</TableCell>
                <TableCell align="right">Theta max</TableCell>
                <TableCell>P-delta</TableCell>
                <TableCell align="right">ELF force ({unitLabel(units, 'force')})</TableCell>
                <TableCell align="right">Shear, unscaled ({unitLabel(units, 'force')})</TableCell>
                <TableCell align="right">Shear, scaled ({unitLabel(units, 'force')})</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {checks.storeys.map((s) => (
                <TableRow key={s.storey}>
                  <TableCell>{s.storey}</TableCell>
                  <TableCell align="right">{s.designDriftRatio.toFixed(5)}</TableCell>
                  <TableCell align="right">{s.driftLimitRatio.toFixed(4)}</TableCell>
                  <TableCell>{PASS(s.driftOk)}</TableCell>
                  <TableCell align="right">{s.theta.toFixed(4)}</TableCell>
                  <TableCell align="right">{s.thetaMax.toFixed(3)}</TableCell>
                  <TableCell>{s.pDelta}</TableCell>
                  <TableCell align="right">
                    {s.elfForce === null
                      ? '-'
                      : formatNumber(toDisplay(units, 'force', s.elfForce))}
                  </TableCell>
                  <TableCell align="right">
                    {formatNumber(toDisplay(units, 'force', s.modalShear))}
                  </TableCell>
                  <TableCell align="right">
                    {formatNumber(toDisplay(units, 'force', s.scaledShear))}
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </ScrollFrame>
        <Box
          sx={{ height: 320, maxWidth: 640, mt: 2 }}
          role="img"
          aria-label="Design drift ratio against elevation, with the limit"
        >
          {/* The wrapper (role img, labelled) speaks for the canvas. */}
          <Scatter
            aria-hidden
            options={{
              ...STATIC_CHART,
              scales: {
                x: {
                  type: 'linear',
                  min: 0,
                  title: { display: true, text: 'Design storey drift / height' },
                },
                y: {
                  min: 0,
                  title: { display: true, text: `Elevation (${unitLabel(units, 'length')})` },
                },
              },
              plugins: { legend: { position: 'bottom' }, title: { display: false } },
            }}
            data={{
              datasets: [
                {
                  label: 'Design drift ratio',
                  data: steps,
                  showLine: true,
                  borderColor: SERIES_COLOURS[0],
                  backgroundColor: SERIES_COLOURS[0],
                  pointRadius: 0,
                  borderWidth: 2,
                },
                {
                  label: 'Limit',
                  data: limit,
                  showLine: true,
                  borderColor: SERIES_COLOURS[5],
                  backgroundColor: SERIES_COLOURS[5],
                  borderDash: [6, 4],
                  pointRadius: 0,
                  borderWidth: 2,
                },
              ],
            }}
          />
        </Box>
      </Box>
      <Box component="section" aria-label="Vertical irregularities">
        <Typography variant="h3" gutterBottom>
          Vertical irregularities
        </Typography>
        {checks.irregularities.length === 0 ? (
          <Typography>None found from the storey table.</Typography>
        ) : (
          <Stack spacing={1}>
            {checks.irregularities.map((f) => (
              <Alert key={`${f.type}-${f.storey}`} severity={f.excepted ? 'info' : 'warning'}>
                {f.message} ({f.clause}){f.excepted ? ` Excepted: ${f.exceptionReason}` : ''}
              </Alert>
            ))}
          </Stack>
        )}
      </Box>
      <Box component="section" aria-label="Notes">
        {checks.notes.map((n) => (
          <Typography key={n} variant="body2" color="text.secondary">
            {n}
          </Typography>
        ))}
      </Box>
    </Stack>
  );
}
