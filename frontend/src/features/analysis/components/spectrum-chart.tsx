import { Box } from '@mui/material';
import type { SpectrumInput } from '@tiermode/shared-types';
import { Scatter } from 'react-chartjs-2';
import { SERIES_COLOURS, STATIC_CHART } from '@/lib/charts';

interface SpectrumChartProps {
  spectrum: SpectrumInput;
  /** Each mode's period and spectral value, marked on the curve. */
  modes: { number: number; period: number; sa: number }[];
}

export function SpectrumChart({ spectrum, modes }: SpectrumChartProps) {
  return (
    <Box
      sx={{ height: 260 }}
      role="img"
      aria-label="Design spectrum: Sa against period, with the modal periods marked"
    >
      {/* The wrapper (role img, labelled) speaks for the canvas. */}
      <Scatter
        aria-hidden
        options={{
          ...STATIC_CHART,
          scales: {
            x: { type: 'linear', title: { display: true, text: 'Period T (s)' }, min: 0 },
            y: { title: { display: true, text: 'Sa (g)' }, min: 0 },
          },
          plugins: { legend: { position: 'bottom' } },
        }}
        data={{
          datasets: [
            {
              label: 'Design spectrum',
              data: spectrum.points.map((p) => ({ x: p.period, y: p.sa })),
              showLine: true,
              borderColor: SERIES_COLOURS[0],
              backgroundColor: SERIES_COLOURS[0],
              pointRadius: 0,
              borderWidth: 2,
            },
            {
              label: 'Modal periods',
              data: modes.map((m) => ({ x: m.period, y: m.sa })),
              borderColor: SERIES_COLOURS[1],
              backgroundColor: SERIES_COLOURS[1],
              pointRadius: 5,
              pointStyle: 'triangle',
            },
          ],
        }}
      />
    </Box>
  );
}
