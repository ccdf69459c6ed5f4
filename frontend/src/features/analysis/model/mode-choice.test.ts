import { act, renderHook } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { STARTING_INPUTS } from './starting-inputs';
import { modeChoiceValue, parseModeChoice, useAnalysisInputs } from './use-analysis-inputs';

describe('the modes combined', () => {
  it('reads back every choice the select offers', () => {
    for (const choice of ['all', 3, { targetMassRatio: 0.9 }] as const) {
      expect(parseModeChoice(modeChoiceValue(choice))).toEqual(choice);
    }
  });

  it('asks for all modes by default, then for the first n or a mass target, never both', () => {
    const { result } = renderHook(() => useAnalysisInputs(STARTING_INPUTS));
    expect(result.current.request).not.toHaveProperty('modeCount');
    expect(result.current.request).not.toHaveProperty('targetMassRatio');
    act(() => result.current.setModeCount(2));
    expect(result.current.request?.modeCount).toBe(2);
    act(() => result.current.setModeCount({ targetMassRatio: 0.95 }));
    expect(result.current.request?.targetMassRatio).toBe(0.95);
    expect(result.current.request).not.toHaveProperty('modeCount');
  });

  it('starts from a saved mass target', () => {
    const { result } = renderHook(() =>
      useAnalysisInputs({ ...STARTING_INPUTS, targetMassRatio: 0.9 }),
    );
    expect(result.current.modeCount).toEqual({ targetMassRatio: 0.9 });
    expect(modeChoiceValue(result.current.modeCount)).toBe('mass-0.9');
  });
});
