import { BadRequestException, Injectable } from '@nestjs/common';
import type {
  AnalysisRequest,
  AnalysisResponse,
  CalculationInputs,
  ResponseHistoryResult,
  ResponseHistorySetup,
  ChecksRequest,
  ChecksResponse,
  ColumnStiffnessRequest,
  ColumnStiffnessResponse,
} from '@tiermode/shared-types';
import { analyse, assertAnalysisRequest } from './engine/analyse';
import { runChecks } from './engine/checks/run-checks';
import { assertHistorySetup, calcResponseHistory } from './engine/history/calc-history';
import { storeyStiffnessFromColumns } from './engine/column-stiffness';

@Injectable()
export class AnalysisService {
  /**
   * Runs the engine. Whatever the DTO could not check (the order of the spectrum periods, a
   * modeCount above the storey count, values too extreme for double precision) the engine refuses
   * with a RangeError or TypeError that names the field; those are the caller's 400s.
   */
  analyse(request: AnalysisRequest): AnalysisResponse {
    return asBadRequest(() => analyse(request));
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

  /** The code-basis checks of the request's analysis (engine/checks/run-checks.ts). */
  checks(request: ChecksRequest): ChecksResponse {
    return this.analyseAndCheck(request).checks;
  }

  /** The analysis and its checks, from one run of the engine. */
  analyseAndCheck(request: ChecksRequest): { analysis: AnalysisResponse; checks: ChecksResponse } {
    return asBadRequest(() => runChecks(JSON.parse(JSON.stringify(request)) as ChecksRequest));
  }

  /** Refuses a response history setup that cannot be run on `levels` levels, naming the field. */
  validateHistory(setup: ResponseHistorySetup, levels: number): void {
    asBadRequest(() => assertHistorySetup(setup, levels));
  }

  /** A calc's response history (engine/history/calc-history.ts). */
  responseHistoryOf(inputs: CalculationInputs, setup: ResponseHistorySetup): ResponseHistoryResult {
    return asBadRequest(() => calcResponseHistory(inputs, setup));
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
