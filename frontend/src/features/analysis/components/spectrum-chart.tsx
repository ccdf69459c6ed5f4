import { Box, FormControlLabel, Stack, Switch, Typography } from '@mui/material';
import type { SpectrumInput } from '@tiermode/shared-types';
import { useState } from 'react';
import { Scatter } from 'react-chartjs-2';
import { SERIES_COLOURS, STATIC_CHART } from '@/lib/charts';
import { formatNumber } from '@/lib/units';
import { modalMarkers } from '../model/modal-markers';

interface SpectrumChartProps {
  spectrum: SpectrumInput;
  /** The modal periods of the last analysis, marked on the curve. */
  modes: { number: number; period: number }[];
}

/**
 * The design spectrum as it stands, with each modal period marked where it meets this curve
 * (Sa read from the table shown, so a regenerated spectrum never carries stale markers). A
 * period past the table's end is listed under the plot instead of stretching the axis.
 */
export function SpectrumChart({ spectrum, modes }: SpectrumChartProps) {
  const [logPeriod, setLogPeriod] = useState(false);
  const points = spectrum.points.filter(
    (p) => Number.isFinite(p.period) && Number.isFinite(p.sa) && (!logPeriod || p.period > 0),
  );
  const sorted = points.every((p, i) => i === 0 || p.period > points[i - 1].period);
  const marked = modalMarkers({ points, interpolation: spectrum.interpolation }, modes);
  const onCurve = marked.filter((m) => m.sa !== null);
  const off = marked.filter((m) => m.sa === null);
  const last = points[points.length - 1]?.period;
  const first = points[0]?.period;
  return (
    <Stack spacing={0.5}>
      <Box
        sx={{ height: 260 }}
        role="img"
        aria-label={`Design spectrum: Sa against period${logPeriod ? ' (log scale)' : ''}, with the modal periods marked`}
      >
        {/* The wrapper (role img, labelled) speaks for the canvas. */}
        <Scatter
          aria-hidden
          options={{
            ...STATIC_CHART,
            scales: {
              x: logPeriod
                ? { type: 'logarithmic', title: { display: true, text: 'Period T (s), log scale' } }
                : { type: 'linear', title: { display: true, text: 'Period T (s)' }, min: 0 },
              y: { title: { display: true, text: 'Sa (g)' }, min: 0 },
            },
            plugins: { legend: { position: 'bottom' } },
          }}
          data={{
            datasets: [
              {
                label: 'Design spectrum',
                data: points.map((p) => ({ x: p.period, y: p.sa })),
                showLine: true,
                borderColor: SERIES_COLOURS[0],
                backgroundColor: SERIES_COLOURS[0],
                pointRadius: 0,
                borderWidth: 2,
              },
              {
                label: 'Modal periods (last analysis)',
                data: onCurve.map((m) => ({ x: m.period, y: m.sa as number })),
                borderColor: SERIES_COLOURS[1],
                backgroundColor: SERIES_COLOURS[1],
                pointRadius: 5,
                pointStyle: 'triangle',
              },
            ],
          }}
        />
      </Box>
      <FormControlLabel
        control={<Switch size="small" checked={logPeriod} onChange={(_, on) => setLogPeriod(on)} />}
        label="Log period axis"
      />
      {logPeriod && spectrum.points.some((p) => p.period === 0) && (
        <Typography variant="caption" color="text.secondary">
          The point at T = 0 s cannot be drawn on a log axis; the table still holds it.
        </Typography>
      )}
      {off.length > 0 && sorted && first !== undefined && last !== undefined && (
        <Typography variant="caption" color="text.secondary" data-testid="modes-off-spectrum">
          Not on this plot:{' '}
          {off
            .map(
              (m) =>
                `mode ${m.number} (T = ${formatNumber(m.period)} s, ${m.period > last ? `past the table's end at ${formatNumber(last)} s` : `before its start at ${formatNumber(first)} s`})`,
            )
            .join('; ')}
          . The analysis reads Sa there as the Results warnings say.
        </Typography>
      )}
    </Stack>
  );
}
