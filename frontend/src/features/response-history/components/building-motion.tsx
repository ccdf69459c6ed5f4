import PauseIcon from '@mui/icons-material/Pause';
import PlayArrowIcon from '@mui/icons-material/PlayArrow';
import { Button, MenuItem, Slider, Stack, TextField, Typography } from '@mui/material';
import { BuildingDrawing } from '@/components/data-display/building-drawing';
import { formatNumber, toDisplay, unitLabel, type UnitSystem } from '@/lib/units';
import { largestShift, levelsAt } from '../model/history-model';
import { SPEEDS, type Timeline } from '../model/use-timeline';

/**
 * The building drawn moving in time: each level's displacement at the timeline's frame, masses
 * on columns over the building at rest, with play, speed and a time slider. The drawing is
 * scaled to the largest displacement of the whole history, said under it.
 */
export function BuildingMotion({
  elevations,
  times,
  displacements,
  timeline,
  units,
  label,
}: {
  /** m, level 1 first */
  elevations: readonly number[];
  times: readonly number[];
  /** m, one array per level, at `times` */
  displacements: readonly (readonly number[])[];
  timeline: Timeline;
  units: UnitSystem;
  /** What moves, for screen readers: "Free vibration from mode 2". */
  label: string;
}) {
  const bound = largestShift(displacements);
  const now = levelsAt(displacements, timeline.frame);
  const roof = now[now.length - 1] ?? 0;
  const length = unitLabel(units, 'displacement');
  return (
    <Stack
      spacing={1}
      sx={{ alignItems: 'flex-start', flexShrink: 0, width: 300, maxWidth: '100%' }}
    >
      <BuildingDrawing
        elevations={elevations}
        shifts={now}
        bound={bound}
        label={`${label}, at t = ${formatNumber(timeline.time, 3)} s`}
      />
      <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap', gap: 1 }}>
        <Button
          variant="outlined"
          size="small"
          startIcon={timeline.playing ? <PauseIcon /> : <PlayArrowIcon />}
          onClick={timeline.toggle}
          disabled={times.length < 2}
        >
          {timeline.playing ? 'Pause' : 'Play'}
        </Button>
        <TextField
          select
          size="small"
          label="Speed"
          value={timeline.speed}
          onChange={(e) => timeline.setSpeed(Number(e.target.value) as (typeof SPEEDS)[number])}
          sx={{ width: 110 }}
        >
          {SPEEDS.map((s) => (
            <MenuItem key={s} value={s}>
              {s}×
            </MenuItem>
          ))}
        </TextField>
      </Stack>
      <Slider
        aria-label="Time (s)"
        value={timeline.time}
        min={0}
        max={timeline.end || 1}
        step={times.length > 1 ? times[1] - times[0] : 0.01}
        valueLabelDisplay="auto"
        valueLabelFormat={(t) => `${formatNumber(t, 3)} s`}
        onChange={(_, t) => timeline.setTime(t)}
        sx={{ width: 280, maxWidth: '100%' }}
      />
      <Typography variant="caption" color="text.secondary" data-testid="motion-time">
        t = {formatNumber(timeline.time, 3)} s · roof{' '}
        {formatNumber(toDisplay(units, 'displacement', roof))} {length} · the widest sway drawn (
        {formatNumber(toDisplay(units, 'displacement', bound))} {length}) reaches a quarter of the
        drawing&apos;s width: the drawing exaggerates the displacements, the numbers do not.
      </Typography>
    </Stack>
  );
}
