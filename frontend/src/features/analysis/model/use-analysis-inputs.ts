import {
  ANALYSIS_LIMITS,
  spectrumPointProblems,
  type AnalysisRequest,
  type SpectrumInput,
} from '@tiermode/shared-types';
import { useCallback, useMemo, useState } from 'react';
import { fromStoreyInputs, storeyProblems, toStoreyInputs, type StoreyRow } from './storey-rows';

/**
 * Which modes are combined: all (the default), the first n, or the fewest whose cumulative
 * effective mass reaches a fraction of the total (only those are solved then).
 */
export type ModeCountChoice = 'all' | number | { targetMassRatio: number };

/** The mass targets offered: 90% is EN 1998-1 4.3.3.3.1(3)'s rule, the others stricter. */
export const MASS_TARGETS = [0.9, 0.95, 0.99] as const;

/** The choice as the select holds it, and back. */
export const modeChoiceValue = (choice: ModeCountChoice): string =>
  typeof choice === 'object' ? `mass-${choice.targetMassRatio}` : String(choice);
export function parseModeChoice(value: string): ModeCountChoice {
  if (value === 'all') return 'all';
  if (value.startsWith('mass-')) return { targetMassRatio: Number(value.slice(5)) };
  return Number(value);
}

function choiceOf(inputs: AnalysisRequest): ModeCountChoice {
  if (inputs.targetMassRatio !== undefined) return { targetMassRatio: inputs.targetMassRatio };
  return inputs.modeCount ?? 'all';
}

function selectionOf(choice: ModeCountChoice, storeys: number) {
  if (typeof choice === 'object') return { targetMassRatio: choice.targetMassRatio };
  return choice !== 'all' && choice <= storeys ? { modeCount: choice } : {};
}

/** Everything a designer edits for one analysis, as the screens hold it. */
export interface AnalysisInputsState {
  rows: StoreyRow[];
  setRows: (rows: StoreyRow[]) => void;
  spectrum: SpectrumInput;
  setSpectrum: (spectrum: SpectrumInput) => void;
  /** Damping as typed, in % of critical. */
  damping: string;
  setDamping: (damping: string) => void;
  dampingProblem: string | null;
  modeCount: ModeCountChoice;
  setModeCount: (modeCount: ModeCountChoice) => void;
  /** The inputs as the API takes them, or null while any of them is not valid. */
  request: AnalysisRequest | null;
  /** Starts again from stored inputs (after a save, or to discard edits). */
  reset: (inputs: AnalysisRequest) => void;
}

/** The point counts the analysis accepts. */
export const SPECTRUM_LIMITS = {
  min: ANALYSIS_LIMITS.minSpectrumPoints,
  max: ANALYSIS_LIMITS.maxSpectrumPoints,
};

const percent = (ratio: number) => String(Number((ratio * 100).toPrecision(10)));

/** The editable inputs of an analysis, starting from `initial`. */
export function useAnalysisInputs(initial: AnalysisRequest): AnalysisInputsState {
  const [rows, setRows] = useState<StoreyRow[]>(() => fromStoreyInputs(initial.storeys));
  const [spectrum, setSpectrum] = useState<SpectrumInput>(initial.spectrum);
  const [damping, setDamping] = useState(() => percent(initial.dampingRatio));
  const [modeCount, setModeCount] = useState<ModeCountChoice>(() => choiceOf(initial));

  const dampingRatio = Number(damping) / 100;
  const dampingProblem =
    damping.trim() === '' || !(dampingRatio > 0 && dampingRatio < 1)
      ? 'Damping must be more than 0% and less than 100%'
      : null;
  const request = useMemo<AnalysisRequest | null>(() => {
    if (storeyProblems(rows).length > 0 || dampingProblem) return null;
    if (spectrumPointProblems(spectrum.points, SPECTRUM_LIMITS).length > 0) return null;
    return {
      storeys: toStoreyInputs(rows),
      spectrum,
      dampingRatio,
      ...selectionOf(modeCount, rows.length),
    };
  }, [rows, spectrum, dampingRatio, dampingProblem, modeCount]);

  const reset = useCallback((inputs: AnalysisRequest) => {
    setRows(fromStoreyInputs(inputs.storeys));
    setSpectrum(inputs.spectrum);
    setDamping(percent(inputs.dampingRatio));
    setModeCount(choiceOf(inputs));
  }, []);

  return {
    rows,
    setRows,
    spectrum,
    setSpectrum,
    damping,
    setDamping,
    dampingProblem,
    modeCount,
    setModeCount,
    request,
    reset,
  };
}
