import {
  summariseAnalysis,
  type AnalysisAnswer,
  type AnalysisDetail,
  type AnalysisRequest,
  type AnalysisResponse,
  type CalculationInputs,
  type ChecksRequest,
  type ChecksResponse,
  type CodeBasisParameters,
  type FreeVibrationRequest,
  type FreeVibrationResponse,
  type RecordSpectrumRequest,
  type RecordSpectrumResponse,
  type ResponseHistoryRequest,
  type ResponseHistoryResponse,
  type ResponseHistoryResult,
  type ResponseHistorySetup,
} from '@tiermode/shared-types';
import { jsonBytes, type JsonBytes } from '../common/json-answer';
import { analyse } from './engine/analyse';
import { runChecks } from './engine/checks/run-checks';
import { calcResponseHistory } from './engine/history/calc-history';
import { freeVibration } from './engine/history/free-vibration';
import { recordSpectrum } from './engine/history/record-spectrum';
import { responseHistory } from './engine/history/response-history';

/**
 * The engine's work as the analysis workers run it (AnalysisService hands every analysis to one,
 * so the thread that answers requests is never held up by a calculation). This module is loaded
 * inside the worker: it imports nothing of Nest, only the engine and the shared types.
 *
 * A stateless route's answer is made into UTF-8 JSON here, beside the analysis: turning a
 * 200-storey answer into text takes as long as half the analysis, and bytes leave a worker
 * without a copy. A calc's results come back as values, to be stored.
 */
export type AnalysisWork =
  | { kind: 'answer'; request: AnalysisRequest; detail: AnalysisDetail }
  | { kind: 'checks'; request: ChecksRequest }
  | { kind: 'free-vibration'; request: FreeVibrationRequest }
  | { kind: 'response-history'; request: ResponseHistoryRequest }
  | { kind: 'record-spectrum'; request: RecordSpectrumRequest }
  | {
      kind: 'calc';
      inputs: CalculationInputs;
      basis: CodeBasisParameters | null;
      history: ResponseHistorySetup | null;
    };

/** What each kind of work gives back. */
export interface AnalysisWorkResults {
  answer: JsonBytes<AnalysisAnswer>;
  checks: JsonBytes<ChecksResponse>;
  'free-vibration': JsonBytes<FreeVibrationResponse>;
  'response-history': JsonBytes<ResponseHistoryResponse>;
  'record-spectrum': JsonBytes<RecordSpectrumResponse>;
  calc: CalcResults;
}

/** A calc's analysis, its checks where it has a code basis, its response history where set. */
export interface CalcResults {
  analysis: AnalysisResponse;
  checks: ChecksResponse | null;
  historyResults: ResponseHistoryResult | null;
}

/** The analysis as much as the caller asked for. */
export function analysisAnswer(full: AnalysisResponse, detail: AnalysisDetail): AnalysisAnswer {
  return detail === 'full' ? full : summariseAnalysis(full);
}

/** Does the work; throws the engine's RangeError/TypeError, naming the field, when it refuses. */
export function runAnalysisWork(work: AnalysisWork): AnalysisWorkResults[AnalysisWork['kind']] {
  switch (work.kind) {
    case 'answer':
      return jsonBytes(analysisAnswer(analyse(work.request), work.detail));
    case 'checks':
      return jsonBytes(runChecks(work.request).checks);
    case 'free-vibration':
      return jsonBytes(freeVibration(work.request));
    case 'response-history':
      return jsonBytes(responseHistory(work.request));
    case 'record-spectrum':
      return jsonBytes(recordSpectrum(work.request));
    case 'calc': {
      const { inputs, basis, history } = work;
      // With a code basis, the checks are made from the same analysis.
      const { analysis, checks } = basis
        ? runChecks({ ...inputs, basis })
        : { analysis: analyse(inputs), checks: null };
      const historyResults = history ? calcResponseHistory(inputs, history) : null;
      return { analysis, checks, historyResults };
    }
  }
}
