import { Box } from '@mui/material';
import { Scatter } from 'react-chartjs-2';
import { SERIES_COLOURS, STATIC_CHART } from '@/lib/charts';

export interface TimeSeries {
  label: string;
  times: readonly number[];
  values: readonly number[];
  /** Dashed (for a second line on the same axes). */
  dashed?: boolean;
}

/**
 * Histories against time on one pair of axes, with the timeline's time marked by a thin grey
 * line when `cursor` is given.
 */
export function TimeChart({
  series,
  yLabel,
  label,
  cursor,
  height = 220,
}: {
  series: TimeSeries[];
  yLabel: string;
  /** What the chart shows, for screen readers. */
  label: string;
  cursor?: number;
  height?: number;
}) {
  const all = series.flatMap((s) => s.values);
  const top = Math.max(0, ...all);
  const bottom = Math.min(0, ...all);
  return (
    <Box sx={{ height, width: '100%' }} role="img" aria-label={label}>
      <Scatter
        aria-hidden
        options={{
          ...STATIC_CHART,
          scales: {
            x: { type: 'linear', title: { display: true, text: 'Time (s)' }, min: 0 },
            y: { title: { display: true, text: yLabel } },
          },
          plugins: { legend: { position: 'bottom' } },
        }}
        data={{
          datasets: [
            ...series.map((s, i) => ({
              label: s.label,
              data: s.times.map((t, k) => ({ x: t, y: s.values[k] })),
              showLine: true,
              pointRadius: 0,
              borderWidth: 1.4,
              borderColor: SERIES_COLOURS[i % SERIES_COLOURS.length],
              backgroundColor: SERIES_COLOURS[i % SERIES_COLOURS.length],
              borderDash: s.dashed ? [5, 3] : undefined,
            })),
            ...(cursor === undefined
              ? []
              : [
                  {
                    label: 'Now',
                    data: [
                      { x: cursor, y: bottom },
                      { x: cursor, y: top },
                    ],
                    showLine: true,
                    pointRadius: 0,
                    borderWidth: 1,
                    borderColor: '#888',
                    backgroundColor: '#888',
                  },
                ]),
          ],
        }}
      />
    </Box>
  );
}
