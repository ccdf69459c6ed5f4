import { Box, Grid } from '@mui/material';
import type { AnalysisSummary } from '@tiermode/shared-types';
import { Scatter } from 'react-chartjs-2';
import { SERIES_COLOURS, STATIC_CHART } from '@/lib/charts';
import { toDisplay, unitLabel, type Quantity, type UnitSystem } from '@/lib/units';
import { COMBINATION_STYLES } from '../../model/combination-styles';

interface Props {
  result: AnalysisSummary;
  elevations: number[];
  units: UnitSystem;
}

type Profile = {
  title: string;
  field: 'storeyShear' | 'overturningMoment' | 'displacement' | 'driftRatio';
  quantity: Quantity | null;
  /** Storey quantities are drawn over the height of their storey; level ones at the level. */
  perStorey: boolean;
};

const PROFILES: Profile[] = [
  { title: 'Storey shear', field: 'storeyShear', quantity: 'force', perStorey: true },
  { title: 'Overturning moment', field: 'overturningMoment', quantity: 'moment', perStorey: false },
  { title: 'Displacement', field: 'displacement', quantity: 'displacement', perStorey: false },
  { title: 'Storey drift ratio', field: 'driftRatio', quantity: null, perStorey: true },
];

/** Combined responses up the height, comparing SRSS, CQC and ABS. */
export function ResponseProfiles({ result, elevations, units }: Props) {
  const levels = [0, ...elevations].map((h) => toDisplay(units, 'length', h));
  const points = (values: number[], profile: Profile) => {
    const shown = values.map((v) => (profile.quantity ? toDisplay(units, profile.quantity, v) : v));
    if (profile.perStorey) {
      // A step: constant over each storey, from level i-1 to level i.
      return shown.flatMap((v, i) => [
        { x: v, y: levels[i] },
        { x: v, y: levels[i + 1] },
      ]);
    }
    if (profile.field === 'overturningMoment') {
      // O_i acts at the base of storey i (level i-1); zero at the roof.
      return [
        ...shown.map((v, i) => ({ x: v, y: levels[i] })),
        { x: 0, y: levels[levels.length - 1] },
      ];
    }
    return [{ x: 0, y: 0 }, ...shown.map((v, i) => ({ x: v, y: levels[i + 1] }))];
  };
  return (
    <Grid container spacing={2}>
      {PROFILES.map((profile) => {
        const unit = profile.quantity ? ` (${unitLabel(units, profile.quantity)})` : '';
        return (
          <Grid key={profile.field} size={{ xs: 12, md: 6 }}>
            <Box
              sx={{ height: 300 }}
              role="img"
              aria-label={`${profile.title} against elevation: SRSS, CQC and ABS`}
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
                      title: { display: true, text: `${profile.title}${unit}` },
                    },
                    y: {
                      min: 0,
                      title: { display: true, text: `Elevation (${unitLabel(units, 'length')})` },
                    },
                  },
                  plugins: {
                    // The legend in the list's order (CQC, SRSS, ABS), not the drawing order.
                    legend: {
                      position: 'bottom',
                      labels: { sort: (a, b) => (a.datasetIndex ?? 0) - (b.datasetIndex ?? 0) },
                    },
                    title: { display: false },
                  },
                }}
                data={{
                  datasets: COMBINATION_STYLES.map((m) => ({
                    label: m.label,
                    data: points(result.combined[m.key][profile.field], profile),
                    showLine: true,
                    borderColor: SERIES_COLOURS[m.colour],
                    backgroundColor: SERIES_COLOURS[m.colour],
                    borderDash: [...m.dash],
                    pointRadius: 0,
                    borderWidth: m.width,
                    order: m.order,
                  })),
                }}
              />
            </Box>
          </Grid>
        );
      })}
    </Grid>
  );
}
