import { Box } from '@mui/material';
import type { ModeSummary } from '@tiermode/shared-types';
import { Scatter } from 'react-chartjs-2';
import { SERIES_COLOURS, STATIC_CHART } from '@/lib/charts';
import { toDisplay, unitLabel, type UnitSystem } from '@/lib/units';

interface Props {
  modes: ModeSummary[];
  elevations: number[];
  units: UnitSystem;
}

/** The given mode shapes (roof = 1 unless noted), elevation up the vertical axis, from the base. */
export function ModeShapeChart({ modes, elevations, units }: Props) {
  const shown = modes;
  return (
    <Box
      sx={{ height: 340 }}
      role="img"
      aria-label="Mode shapes, normalised to 1 at the roof, against elevation"
    >
      {/* The wrapper (role img, labelled) speaks for the canvas. */}
      <Scatter
        aria-hidden
        options={{
          ...STATIC_CHART,
          scales: {
            x: { type: 'linear', title: { display: true, text: 'Mode shape (roof = 1)' } },
            y: {
              title: { display: true, text: `Elevation (${unitLabel(units, 'length')})` },
              min: 0,
            },
          },
          plugins: { legend: { position: 'bottom' } },
        }}
        data={{
          datasets: shown.map((m, i) => ({
            label: `Mode ${m.number} (T = ${m.period.toFixed(3)} s)`,
            data: [
              { x: 0, y: 0 },
              ...m.shape.map((v, level) => ({
                x: v,
                y: toDisplay(units, 'length', elevations[level]),
              })),
            ],
            showLine: true,
            borderColor: SERIES_COLOURS[i % SERIES_COLOURS.length],
            backgroundColor: SERIES_COLOURS[i % SERIES_COLOURS.length],
            pointRadius: 3,
          })),
        }}
      />
    </Box>
  );
}
