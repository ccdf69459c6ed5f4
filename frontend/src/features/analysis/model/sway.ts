/** A mode as the sway needs it: its circular frequency and its shape, level 1 first. */
export interface SwayMode {
  circularFrequency: number;
  shape: readonly number[];
}

/**
 * Each level's displacement at time t when the chosen modes sway together, each with its own
 * shape as amplitude and no damping: u_i(t) = sum over the modes of phi_i cos(omega t). This is
 * free vibration as a sum of modal cosines, started from rest at the summed shape (Chopra,
 * Dynamics of Structures, chapter 10, "Free vibration of undamped systems").
 */
export function swayAt(modes: readonly SwayMode[], t: number): number[] {
  const levels = modes[0]?.shape.length ?? 0;
  const u = new Array<number>(levels).fill(0);
  for (const mode of modes) {
    const c = Math.cos(mode.circularFrequency * t);
    for (let i = 0; i < levels; i += 1) u[i] += mode.shape[i] * c;
  }
  return u;
}

/** The largest |u_i| the sway can reach: the sum of |phi_i| over the modes, at its worst level. */
export function swayBound(modes: readonly SwayMode[]): number {
  const levels = modes[0]?.shape.length ?? 0;
  let bound = 0;
  for (let i = 0; i < levels; i += 1) {
    bound = Math.max(
      bound,
      modes.reduce((sum, m) => sum + Math.abs(m.shape[i]), 0),
    );
  }
  return bound;
}
