import PauseIcon from '@mui/icons-material/Pause';
import PlayArrowIcon from '@mui/icons-material/PlayArrow';
import { Button, MenuItem, Stack, TextField, Typography } from '@mui/material';
import type { ModeSummary } from '@tiermode/shared-types';
import { useEffect, useRef, useState } from 'react';
import { BuildingDrawing } from '@/components/data-display/building-drawing';
import { formatNumber } from '@/lib/units';
import { swayAt, swayBound } from '../../model/sway';

/** Real seconds one cycle of the slowest chosen mode takes at speed 1. */
const SECONDS_PER_CYCLE = 2.5;
const SPEEDS = [0.25, 0.5, 1, 2] as const;

/**
 * The building swaying in the chosen modes: each level moves as the sum of its modal cosines,
 * u_i(t) = sum of phi_i cos(omega t). Drawn as floors and columns over the still outline, slowed
 * so that the slowest chosen mode takes 2.5 s a cycle at speed 1. Starts paused.
 */
export function SwayAnimation({
  modes,
  elevations,
}: {
  modes: ModeSummary[];
  /** m, level 1 first */
  elevations: number[];
}) {
  const [playing, setPlaying] = useState(false);
  const [speed, setSpeed] = useState<(typeof SPEEDS)[number]>(1);
  const [time, setTime] = useState(0);
  const frame = useRef<number | null>(null);
  const slowest = Math.max(...modes.map((m) => m.period), 0);
  const slowdown = slowest > 0 ? SECONDS_PER_CYCLE / slowest : 1;

  useEffect(() => {
    if (!playing || modes.length === 0) return;
    let last = performance.now();
    const step = (now: number) => {
      const dt = (now - last) / 1000;
      last = now;
      setTime((t) => t + (dt * speed) / slowdown);
      frame.current = requestAnimationFrame(step);
    };
    frame.current = requestAnimationFrame(step);
    return () => {
      if (frame.current !== null) cancelAnimationFrame(frame.current);
    };
  }, [playing, speed, slowdown, modes.length]);

  const bound = swayBound(modes) || 1;
  const u = swayAt(modes, time);
  const names = modes.map((m) => m.number).join(', ');

  return (
    <Stack spacing={1} sx={{ alignItems: 'flex-start' }}>
      <BuildingDrawing
        elevations={elevations}
        shifts={u}
        bound={bound}
        label={`The building swaying in mode${modes.length > 1 ? 's' : ''} ${names}, each level moving as the sum of its modal cosines`}
      />
      <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
        <Button
          variant="outlined"
          size="small"
          startIcon={playing ? <PauseIcon /> : <PlayArrowIcon />}
          onClick={() => setPlaying(!playing)}
          disabled={modes.length === 0}
        >
          {playing ? 'Pause' : 'Play'}
        </Button>
        <TextField
          select
          size="small"
          label="Speed"
          value={speed}
          onChange={(e) => setSpeed(Number(e.target.value) as (typeof SPEEDS)[number])}
          sx={{ width: 110 }}
        >
          {SPEEDS.map((s) => (
            <MenuItem key={s} value={s}>
              {s}×
            </MenuItem>
          ))}
        </TextField>
        <Button size="small" onClick={() => setTime(0)}>
          Back to the start
        </Button>
      </Stack>
      <Typography variant="caption" color="text.secondary" data-testid="sway-time">
        t = {formatNumber(time, 3)} s of the building&apos;s time, played at{' '}
        {formatNumber(speed / slowdown, 3)} × its own speed. Each mode moves with its shape as
        amplitude (undamped), so the drawing shows how the modes combine, not a design response.
      </Typography>
    </Stack>
  );
}
