import {
  Alert,
  LinearProgress,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import {
  historyComparison,
  type AnalysisSummary,
  type ResponseHistoryResult,
  type ResponseHistorySetup,
  type StoreyInput,
} from '@tiermode/shared-types';
import { ScrollFrame } from '@/components/data-display/scroll-frame';
import { errorMessages } from '@/lib/api-client';
import { formatNumber, toDisplay, unitLabel, type Quantity, type UnitSystem } from '@/lib/units';
import { useResponseHistory } from '../api/response-history';
import { BuildingMotion } from './building-motion';
import { bareStoreys, elevationsOf } from '../model/history-model';
import { useTimeline } from '../model/use-timeline';
import { TimeChart } from './time-chart';

const FRAMES = 600;

/**
 * The stored response history of a calc: how the record was scaled, the building moving under
 * it (frames asked of POST /api/response-history for the same record, scale and building), the
 * roof displacement and base shear in time, the peaks storey by storey with their times, and
 * the peaks beside the combined spectrum results (CQC).
 */
export function HistoryResults({
  results,
  setup,
  analysis,
  storeys,
  dampingRatio,
  units,
}: {
  results: ResponseHistoryResult;
  setup: ResponseHistorySetup;
  analysis: AnalysisSummary;
  storeys: StoreyInput[];
  dampingRatio: number;
  units: UnitSystem;
}) {
  const response = results.response;
  const { record } = setup;
  const frames = useResponseHistory({
    storeys: bareStoreys(storeys),
    dampingRatio,
    record: { timeStep: record.timeStep, accelerations: record.accelerations, units: record.units },
    scale: results.scaling.factor,
    animationFrames: FRAMES,
  });
  const animation = frames.data?.animation;
  const timeline = useTimeline(animation?.times ?? []);
  const elevations = elevationsOf(storeys);
  const show = (quantity: Quantity, si: number) => formatNumber(toDisplay(units, quantity, si));
  const u = (quantity: Quantity) => unitLabel(units, quantity);
  const roof = response.histories.roofDisplacement;
  const shear = response.histories.baseShear;
  const peaks = response.peaks;
  const at = response.peakTimes;
  const comparison = historyComparison(peaks, analysis.combined.cqc);
  const row = (storey: number, quantity: string) =>
    comparison.find((r) => r.storey === storey && r.quantity === quantity)!;

  return (
    <Stack spacing={2}>
      <Typography data-testid="history-scaling">
        {results.scaling.explanation} Peak ground acceleration after scaling{' '}
        {formatNumber(response.record.peakGroundAcceleration)} g; {response.modeCount} modes
        superposed (all).
      </Typography>
      {response.warnings.map((w) => (
        <Alert key={w} severity="warning">
          {w}
        </Alert>
      ))}
      {frames.isFetching && <LinearProgress aria-label="Drawing the building's motion" />}
      {frames.error && (
        <Alert severity="error" role="alert">
          {errorMessages(frames.error).join(' ')}
        </Alert>
      )}
      <Stack direction={{ xs: 'column', md: 'row' }} spacing={2} sx={{ alignItems: 'flex-start' }}>
        {animation && animation.displacements.length === storeys.length && (
          <BuildingMotion
            elevations={elevations}
            times={animation.times}
            displacements={animation.displacements}
            timeline={timeline}
            units={units}
            label="The building under the record, displacements relative to the ground"
          />
        )}
        <Stack spacing={1} sx={{ flex: 1, minWidth: 0, width: '100%' }}>
          <TimeChart
            label="Roof displacement relative to the ground, in time"
            yLabel={`Roof displacement (${u('displacement')})`}
            cursor={animation ? timeline.time : undefined}
            series={[
              {
                label: 'Roof',
                times: roof.times,
                values: roof.values.map((v) => toDisplay(units, 'displacement', v)),
              },
            ]}
          />
          <TimeChart
            label="Base shear in time"
            yLabel={`Base shear (${u('force')})`}
            cursor={animation ? timeline.time : undefined}
            series={[
              {
                label: 'Base shear',
                times: shear.times,
                values: shear.values.map((v) => toDisplay(units, 'force', v)),
              },
            ]}
          />
          {response.histories.decimated && (
            <Typography variant="caption" color="text.secondary">
              Drawn from {roof.values.length} of {response.record.steps} samples (each span&apos;s
              least and greatest), so every peak shows; the drawing of the building uses {FRAMES}{' '}
              evenly spaced frames.
            </Typography>
          )}
        </Stack>
      </Stack>

      <Typography variant="h3">Peak responses to the record</Typography>
      <ScrollFrame label="Peak responses to the record, storey by storey">
        <Table size="small">
          <TableHead>
            <TableRow>
              <TableCell>Storey</TableCell>
              <TableCell align="right">Displacement ({u('displacement')})</TableCell>
              <TableCell align="right">at (s)</TableCell>
              <TableCell align="right">Drift ratio</TableCell>
              <TableCell align="right">Floor force ({u('force')})</TableCell>
              <TableCell align="right">Shear ({u('force')})</TableCell>
              <TableCell align="right">at (s)</TableCell>
              <TableCell align="right">Moment ({u('moment')})</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {peaks.displacement.map((_, i) => (
              <TableRow key={i}>
                <TableCell>
                  {i + 1}
                  {storeys[i]?.label ? ` ${storeys[i].label}` : ''}
                </TableCell>
                <TableCell align="right">{show('displacement', peaks.displacement[i])}</TableCell>
                <TableCell align="right">{formatNumber(at.displacement[i])}</TableCell>
                <TableCell align="right">{formatNumber(peaks.driftRatio[i])}</TableCell>
                <TableCell align="right">{show('force', peaks.floorForce[i])}</TableCell>
                <TableCell align="right">{show('force', peaks.shear[i])}</TableCell>
                <TableCell align="right">{formatNumber(at.shear[i])}</TableCell>
                <TableCell align="right">{show('moment', peaks.overturningMoment[i])}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </ScrollFrame>
      <Typography variant="caption" color="text.secondary">
        Absolute maxima over the record&apos;s samples, each at its own time. Base shear{' '}
        {show('force', response.base.shear)} {u('force')} at {formatNumber(response.base.shearTime)}{' '}
        s; base moment {show('moment', response.base.moment)} {u('moment')} at{' '}
        {formatNumber(response.base.momentTime)} s.
      </Typography>

      <Typography variant="h3">Against the response spectrum (CQC)</Typography>
      <ScrollFrame label="Response history peaks against the CQC spectrum results, storey by storey">
        <Table size="small">
          <TableHead>
            <TableRow>
              <TableCell>Storey</TableCell>
              <TableCell align="right">Displacement, history ({u('displacement')})</TableCell>
              <TableCell align="right">CQC</TableCell>
              <TableCell align="right">Ratio</TableCell>
              <TableCell align="right">Shear, history ({u('force')})</TableCell>
              <TableCell align="right">CQC</TableCell>
              <TableCell align="right">Ratio</TableCell>
              <TableCell align="right">Moment, history ({u('moment')})</TableCell>
              <TableCell align="right">CQC</TableCell>
              <TableCell align="right">Ratio</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {peaks.displacement.map((_, i) => {
              const cells = (['displacement', 'shear', 'overturningMoment'] as const).flatMap(
                (quantity) => {
                  const r = row(i + 1, quantity);
                  const unit: Quantity =
                    quantity === 'displacement'
                      ? 'displacement'
                      : quantity === 'shear'
                        ? 'force'
                        : 'moment';
                  return [
                    show(unit, r.history),
                    show(unit, r.spectrum),
                    r.ratio === null ? '—' : formatNumber(r.ratio, 3),
                  ];
                },
              );
              return (
                <TableRow key={i}>
                  <TableCell>{i + 1}</TableCell>
                  {cells.map((text, k) => (
                    <TableCell key={k} align="right">
                      {text}
                    </TableCell>
                  ))}
                </TableRow>
              );
            })}
          </TableBody>
        </Table>
      </ScrollFrame>
      <Typography variant="caption" color="text.secondary">
        Both elastic: no R, q or Cd. A ratio above 1 means this record, as scaled, asks more of that
        storey than the design spectrum&apos;s combined modal maxima; one record is not a design,
        and the code&apos;s rules for the number and choice of records govern.
      </Typography>
    </Stack>
  );
}
