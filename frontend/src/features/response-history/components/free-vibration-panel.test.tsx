import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { FreeVibrationSetup, ModeSummary } from '@tiermode/shared-types';
import { useState } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import type { UnitSystem } from '@/lib/units';
import { FreeVibrationPanel } from './free-vibration-panel';

// The panel's server answer is not what these tests look at.
vi.mock('../api/response-history', () => ({
  useFreeVibration: () => ({ data: undefined, isFetching: false, error: null }),
}));

const storeys = [
  { mass: 2e5, stiffness: 1.5e8, height: 3.5 },
  { mass: 2e5, stiffness: 1.5e8, height: 3.5 },
];
const modes = [
  { number: 1, period: 0.5, shape: [0.618, 1] },
  { number: 2, period: 0.19, shape: [-1.618, 1] },
] as ModeSummary[];

function Harness({
  units,
  onSetup,
}: {
  units: UnitSystem;
  onSetup: (s: FreeVibrationSetup) => void;
}) {
  const [setup, setSetup] = useState<FreeVibrationSetup>({
    start: { kind: 'mode', mode: 1, amplitude: 0.0254 },
    duration: 5,
    timeStep: 0.01,
  });
  return (
    <FreeVibrationPanel
      storeys={storeys}
      dampingRatio={0.05}
      modes={modes}
      units={units}
      setup={setup}
      onChange={(next) => {
        setSetup(next);
        onSetup(next);
      }}
    />
  );
}

describe('FreeVibrationPanel', () => {
  it('shows the start amplitude in the units on screen, and reads a typed one in them', async () => {
    const onSetup = vi.fn();
    const { rerender } = renderWithProviders(<Harness units="SI" onSetup={onSetup} />);
    // 0.0254 m is 25.4 mm, and exactly 1 in (1 in = 25.4 mm, by definition).
    expect(screen.getByLabelText('Roof displacement at the start (mm)')).toHaveValue('25.4');
    rerender(<Harness units="US" onSetup={onSetup} />);
    const inches = screen.getByLabelText('Roof displacement at the start (in)');
    expect(inches).toHaveValue('1');
    await userEvent.clear(inches);
    await userEvent.type(inches, '2');
    expect(onSetup).toHaveBeenLastCalledWith(
      expect.objectContaining({
        start: { kind: 'mode', mode: 1, amplitude: expect.closeTo(0.0508, 12) },
      }),
    );
  });
});
