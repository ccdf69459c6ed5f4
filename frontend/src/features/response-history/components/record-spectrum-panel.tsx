import { Alert, Box, LinearProgress, Stack, Typography } from '@mui/material';
import {
  interpolateSpectrum,
  logPeriods,
  scalingPeriods,
  spectrumScaleFactor,
  type GroundMotionRecord,
  type RecordScaling,
  type SpectrumInput,
} from '@tiermode/shared-types';
import { Scatter } from 'react-chartjs-2';
import { errorMessages } from '@/lib/api-client';
import { SERIES_COLOURS, STATIC_CHART } from '@/lib/charts';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { formatNumber } from '@/lib/units';
import { useRecordSpectrum } from '../api/response-history';

const GRID = [0, ...logPeriods(0.02, 10, 80)];

/**
 * The record's response spectrum at the calc's damping (POST /api/record-spectrum), scaled as
 * chosen, over the design spectrum, with the modal periods marked and the scaling range drawn.
 * The factor shown here is a preview; the analysis finds it again and stores it with the calc.
 */
export function RecordSpectrumPanel({
  record,
  scaling,
  dampingRatio,
  design,
  modalPeriods,
}: {
  record: GroundMotionRecord;
  scaling: RecordScaling;
  dampingRatio: number;
  design: SpectrumInput;
  modalPeriods: number[];
}) {
  const rangePeriods = scaling.method === 'spectrum' ? scalingPeriods(scaling.periodRange) : [];
  const periods = [...new Set([...GRID, ...modalPeriods.filter((t) => t <= 50), ...rangePeriods])]
    .filter((t) => t >= 0 && t <= 50)
    .sort((a, b) => a - b);
  const request = useDebouncedValue(
    {
      record: {
        timeStep: record.timeStep,
        accelerations: record.accelerations,
        units: record.units,
      },
      dampingRatio,
      periods,
    },
    300,
  );
  const spectrum = useRecordSpectrum(request);
  const answer = spectrum.data;
  const saAt = (t: number) => answer?.sa[answer.periods.indexOf(t)] ?? Number.NaN;
  let factor: number | null = scaling.method === 'factor' ? scaling.factor : null;
  let outside: string | null = null;
  if (answer && scaling.method === 'spectrum') {
    const design90 = rangePeriods.map((t) =>
      interpolateSpectrum(design.points, t, design.interpolation),
    );
    if (design90.some((v) => v === null)) {
      outside = `The range ${formatNumber(scaling.periodRange[0])} s to ${formatNumber(scaling.periodRange[1])} s reaches outside the design spectrum's table; the analysis will refuse it.`;
    } else {
      factor = spectrumScaleFactor(scaling.rule, rangePeriods.map(saAt), design90 as number[]);
    }
  }
  const scaled = answer
    ? answer.periods.filter((t) => t <= 10).map((t) => ({ x: t, y: saAt(t) * (factor ?? 1) }))
    : [];
  const top = Math.max(...design.points.map((p) => p.sa), ...scaled.map((p) => p.y), 0.1);
  return (
    <Stack spacing={1}>
      {spectrum.isFetching && <LinearProgress aria-label="Finding the record's spectrum" />}
      {spectrum.error && (
        <Alert severity="error" role="alert">
          {errorMessages(spectrum.error).join(' ')}
        </Alert>
      )}
      {outside && <Alert severity="warning">{outside}</Alert>}
      <Box
        sx={{ height: 300 }}
        role="img"
        aria-label="The record's response spectrum, scaled, over the design spectrum, with the modal periods and the scaling range marked"
      >
        <Scatter
          aria-hidden
          options={{
            ...STATIC_CHART,
            scales: {
              x: {
                type: 'linear',
                min: 0,
                max: 10,
                title: { display: true, text: 'Period T (s)' },
              },
              y: { min: 0, title: { display: true, text: 'Sa (g)' } },
            },
            plugins: {
              legend: { position: 'bottom', labels: { filter: (item) => item.text !== '' } },
            },
          }}
          data={{
            datasets: [
              {
                label: 'Design spectrum (this calc)',
                data: design.points
                  .filter((p) => p.period <= 10)
                  .map((p) => ({ x: p.period, y: p.sa })),
                showLine: true,
                pointRadius: 0,
                borderWidth: 4,
                borderColor: '#9db3c4',
                backgroundColor: '#9db3c4',
                order: 3,
              },
              {
                label: `Record, ${formatNumber(dampingRatio * 100)} % damped${factor !== null ? `, × ${formatNumber(factor)}` : ''}`,
                data: scaled,
                showLine: true,
                pointRadius: 0,
                borderWidth: 1.5,
                borderColor: SERIES_COLOURS[1],
                backgroundColor: SERIES_COLOURS[1],
                order: 1,
              },
              {
                label: 'Modal periods',
                data: modalPeriods
                  .filter((t) => t <= 10)
                  .map((t) => ({ x: t, y: saAt(t) * (factor ?? 1) })),
                pointRadius: 5,
                pointStyle: 'triangle',
                borderColor: SERIES_COLOURS[0],
                backgroundColor: SERIES_COLOURS[0],
                order: 0,
              },
              ...(scaling.method === 'spectrum'
                ? scaling.periodRange.map((t, i) => ({
                    label: i === 0 ? 'Scaling range' : '',
                    data: [
                      { x: t, y: 0 },
                      { x: t, y: top },
                    ],
                    showLine: true,
                    pointRadius: 0,
                    borderWidth: 1,
                    borderDash: [4, 4],
                    borderColor: '#777',
                    backgroundColor: '#777',
                    order: 2,
                  }))
                : []),
            ],
          }}
        />
      </Box>
      <Typography variant="body2" data-testid="scale-preview">
        {factor === null
          ? 'Scale factor: waiting for the record spectrum.'
          : `Scale factor ${formatNumber(factor)}${scaling.method === 'spectrum' ? ` (${scaling.rule === 'mean' ? 'mean over the range' : 'nowhere below 90 % in the range'}; a preview: the analysis finds it again and keeps it)` : ''}.`}{' '}
        Pseudo-acceleration from the exact step of each oscillator under the record.
      </Typography>
    </Stack>
  );
}
