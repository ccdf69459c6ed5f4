import { Box } from '@mui/material';
import type { ModeSummary } from '@tiermode/shared-types';
import { Chart } from 'react-chartjs-2';
import { SERIES_COLOURS, STATIC_CHART } from '@/lib/charts';

/** Effective modal mass of each mode as bars, the cumulative ratio as a line, and the 90% mark. */
export function MassChart({ modes }: { modes: ModeSummary[] }) {
  const shown = modes.slice(0, 30);
  return (
    <Box
      sx={{ height: 300 }}
      role="img"
      aria-label="Effective modal mass by mode, with the cumulative mass ratio"
    >
      {/* The wrapper (role img, labelled) speaks for the canvas. */}
      <Chart
        aria-hidden
        type="bar"
        options={{
          ...STATIC_CHART,
          scales: {
            x: { title: { display: true, text: 'Mode' } },
            y: { min: 0, max: 100, title: { display: true, text: '% of total mass' } },
          },
          plugins: { legend: { position: 'bottom' } },
        }}
        data={{
          labels: shown.map((m) => String(m.number)),
          datasets: [
            {
              type: 'bar' as const,
              label: 'Effective modal mass (%)',
              data: shown.map((m) => m.effectiveMassRatio * 100),
              backgroundColor: SERIES_COLOURS[0],
            },
            {
              type: 'line' as const,
              label: 'Cumulative mass ratio (%)',
              data: shown.map((m) => m.cumulativeMassRatio * 100),
              borderColor: SERIES_COLOURS[1],
              backgroundColor: SERIES_COLOURS[1],
            },
            {
              type: 'line' as const,
              label: '90% of the mass',
              data: shown.map(() => 90),
              borderColor: '#888888',
              borderDash: [6, 4],
              pointRadius: 0,
            },
          ],
        }}
      />
    </Box>
  );
}
