import { availableParallelism } from 'node:os';
import { join } from 'node:path';
import { BadRequestException, Injectable, type OnModuleDestroy } from '@nestjs/common';
import type {
  AnalysisAnswer,
  AnalysisDetail,
  AnalysisRequest,
  CalculationInputs,
  ChecksRequest,
  ChecksResponse,
  CodeBasisParameters,
  ColumnStiffnessRequest,
  ColumnStiffnessResponse,
  FreeVibrationRequest,
  FreeVibrationResponse,
  RecordSpectrumRequest,
  RecordSpectrumResponse,
  ResponseHistoryRequest,
  ResponseHistoryResponse,
  ResponseHistorySetup,
} from '@tiermode/shared-types';
import { assertAnalysisRequest } from './engine/analyse';
import { assertHistorySetup } from './engine/history/calc-history';
import { storeyStiffnessFromColumns } from './engine/column-stiffness';
import type { JsonBytes } from '../common/json-answer';
import { WorkerPool } from '../common/worker-pool';
import type { AnalysisWork, AnalysisWorkResults, CalcResults } from './analysis-work';

/**
 * The analysis workers: as many as the machine has cores, at most four. The thread that answers
 * requests only reads bodies, checks them and writes answers while they work. Every analysis
 * goes to them, small ones too: the hop costs a few hundredths of a millisecond, and under load
 * even a 20-storey analysis and its JSON are a third of what that thread would otherwise do
 * (issue 16's load run: 20 storeys went from about 0.31 to 0.37 of /api/health). A tall
 * building's (200 storeys: about 16 ms with its JSON, 500: about 100 ms) would hold up every
 * other request.
 */
const ANALYSIS_THREADS = Math.max(1, Math.min(4, availableParallelism()));

@Injectable()
export class AnalysisService implements OnModuleDestroy {
  private readonly workers = new WorkerPool<AnalysisWork, unknown>({
    size: ANALYSIS_THREADS,
    name: 'analysis',
    // Under Jest this file is TypeScript, and so is the module the worker loads: the worker
    // registers ts-node first. Built, both are JavaScript.
    workerData: {
      module: join(__dirname, 'analysis-work'),
      tsNode: __filename.endsWith('.ts') ? require.resolve('ts-node') : null,
    },
    handler: `
const { workerData } = require('node:worker_threads');
if (workerData.tsNode) require(workerData.tsNode).register({ transpileOnly: true });
const { runAnalysisWork } = require(workerData.module);
function handle(work) {
  return runAnalysisWork(work);
}`,
  });

  onModuleDestroy(): Promise<void> {
    return this.workers.close();
  }

  /** The analysis as UTF-8 JSON, as much as `detail` asks for. */
  answerJson(request: AnalysisRequest, detail: AnalysisDetail): Promise<JsonBytes<AnalysisAnswer>> {
    return this.run({ kind: 'answer', request, detail });
  }

  /** The code-basis checks of the request's analysis (engine/checks/run-checks.ts), as JSON. */
  checksJson(request: ChecksRequest): Promise<JsonBytes<ChecksResponse>> {
    return this.run({ kind: 'checks', request });
  }

  /** Free vibration (engine/history/free-vibration.ts), as JSON. */
  freeVibrationJson(request: FreeVibrationRequest): Promise<JsonBytes<FreeVibrationResponse>> {
    return this.run({ kind: 'free-vibration', request });
  }

  /** A response history under a record (engine/history/response-history.ts), as JSON. */
  responseHistoryJson(
    request: ResponseHistoryRequest,
  ): Promise<JsonBytes<ResponseHistoryResponse>> {
    return this.run({ kind: 'response-history', request });
  }

  /** A record's response spectrum (engine/history/record-spectrum.ts), as JSON. */
  recordSpectrumJson(request: RecordSpectrumRequest): Promise<JsonBytes<RecordSpectrumResponse>> {
    return this.run({ kind: 'record-spectrum', request });
  }

  /**
   * A calc's analysis, with its checks where it has a code basis and its response history where
   * it has a record, from one run of the engine.
   */
  calcResults(
    inputs: CalculationInputs,
    basis: CodeBasisParameters | null,
    history: ResponseHistorySetup | null,
  ): Promise<CalcResults> {
    return this.run({ kind: 'calc', inputs, basis, history });
  }

  /**
   * Runs the engine on a worker thread. Whatever the DTO could not check (the order of the
   * spectrum periods, a modeCount above the storey count, values too extreme for double
   * precision) the engine refuses with a RangeError or TypeError that names the field; those
   * are the caller's 400s.
   */
  private async run<W extends AnalysisWork>(work: W): Promise<AnalysisWorkResults[W['kind']]> {
    try {
      return (await this.workers.run(work)) as AnalysisWorkResults[W['kind']];
    } catch (error) {
      return asBadRequest(() => {
        throw error;
      });
    }
  }

  /**
   * Refuses inputs the engine could not analyse, with the field named; `path` is where the inputs
   * sit in the request body (e.g. "inputs." for a saved calculation).
   */
  validate(request: AnalysisRequest, path = ''): void {
    try {
      assertAnalysisRequest(request);
    } catch (error) {
      if (error instanceof RangeError || error instanceof TypeError) {
        throw new BadRequestException([`${path}${error.message}`]);
      }
      throw error;
    }
  }

  /** Refuses a response history setup that cannot be run on `levels` levels, naming the field. */
  validateHistory(setup: ResponseHistorySetup, levels: number): void {
    asBadRequest(() => assertHistorySetup(setup, levels));
  }

  columnStiffness(request: ColumnStiffnessRequest): ColumnStiffnessResponse {
    return asBadRequest(() => {
      const contributions = request.columns.map((group) =>
        storeyStiffnessFromColumns([group], request.height),
      );
      return {
        stiffness: storeyStiffnessFromColumns(request.columns, request.height),
        contributions,
      };
    });
  }
}

/** The engine's RangeError/TypeError name the field: they are the caller's 400s. */
export function asBadRequest<T>(run: () => T): T {
  try {
    return run();
  } catch (error) {
    if (error instanceof RangeError || error instanceof TypeError) {
      throw new BadRequestException([error.message]);
    }
    throw error;
  }
}
