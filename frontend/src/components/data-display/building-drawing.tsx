import { Box } from '@mui/material';

const PAD = 24;

/**
 * A shear building drawn in elevation: each level a mass (a block on its floor), each storey two
 * columns from the level below, over the building at rest (dashed). `shifts` are the levels'
 * displacements, drawn so that `bound` reaches a quarter of the width either side of the centre.
 */
export function BuildingDrawing({
  elevations,
  shifts,
  bound,
  label,
  width = 280,
  height = 340,
}: {
  /** m, level 1 first */
  elevations: readonly number[];
  /** Level displacements, level 1 first (any unit, the same as `bound`). */
  shifts: readonly number[];
  /** The largest displacement the drawing must hold. */
  bound: number;
  /** What the drawing shows, for screen readers. */
  label: string;
  width?: number;
  height?: number;
}) {
  const top = elevations[elevations.length - 1] || 1;
  const y = (h: number) => height - PAD - (h / top) * (height - 2 * PAD);
  const x = (shift: number) => width / 2 + (shift / (bound || 1)) * (width / 4);
  const halfBay = width / 6;
  const levels = [0, ...elevations];
  const moved = [0, ...shifts];
  // Blocks no taller than a third of the smallest storey, so they never overlap.
  const block = Math.min(12, ...levels.slice(1).map((h, k) => (y(levels[k]) - y(h)) / 3));
  return (
    <Box
      component="svg"
      role="img"
      aria-label={label}
      viewBox={`0 0 ${width} ${height}`}
      sx={{ width, maxWidth: '100%', height: 'auto', bgcolor: 'grey.50' }}
    >
      <line x1={PAD / 2} x2={width - PAD / 2} y1={y(0)} y2={y(0)} stroke="#555" strokeWidth={3} />
      {levels.slice(1).map((h, k) => {
        const i = k + 1;
        const below = levels[i - 1];
        return (
          <g key={i}>
            <rect
              x={width / 2 - halfBay}
              y={y(h)}
              width={2 * halfBay}
              height={y(below) - y(h)}
              fill="none"
              stroke="#bbb"
              strokeDasharray="3 3"
            />
            {[-halfBay, halfBay].map((side) => (
              <line
                key={side}
                x1={x(moved[i - 1]) + side}
                y1={y(below)}
                x2={x(moved[i]) + side}
                y2={y(h)}
                stroke="#23465f"
                strokeWidth={2}
              />
            ))}
            <rect
              x={x(moved[i]) - halfBay - 6}
              y={y(h) - block}
              width={2 * halfBay + 12}
              height={Math.max(block, 2)}
              fill="#b5541c"
              rx={1}
            />
          </g>
        );
      })}
    </Box>
  );
}
