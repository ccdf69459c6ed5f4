import { useEffect, useRef, useState } from 'react';
import { frameAt } from './history-model';

/** Playback speeds: times the building's own time. */
export const SPEEDS = [0.1, 0.25, 0.5, 1] as const;

/** A time in a history and the means to move it: play, pause, speed, and a slider. */
export function useTimeline(times: readonly number[]) {
  const [time, setTime] = useState(0);
  const [playing, setPlaying] = useState(false);
  const [speed, setSpeed] = useState<(typeof SPEEDS)[number]>(0.25);
  const frame = useRef<number | null>(null);
  const end = times[times.length - 1] ?? 0;
  useEffect(() => {
    if (!playing) return;
    let last = performance.now();
    const step = (now: number) => {
      const dt = ((now - last) / 1000) * speed;
      last = now;
      setTime((t) => {
        const next = t + dt;
        if (next >= end) {
          setPlaying(false);
          return end;
        }
        return next;
      });
      frame.current = requestAnimationFrame(step);
    };
    frame.current = requestAnimationFrame(step);
    return () => {
      if (frame.current !== null) cancelAnimationFrame(frame.current);
    };
  }, [playing, speed, end]);
  const shown = Math.min(time, end);
  return {
    time: shown,
    frame: frameAt(times, shown),
    end,
    playing,
    speed,
    setSpeed,
    setTime: (t: number) => setTime(Math.max(0, Math.min(end, t))),
    toggle: () => {
      if (!playing && shown >= end) setTime(0);
      setPlaying(!playing);
    },
  };
}

export type Timeline = ReturnType<typeof useTimeline>;
