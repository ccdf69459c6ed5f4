import { BadRequestException, Injectable } from '@nestjs/common';
import type { AnalysisRequest, AnalysisResponse } from '@tiermode/shared-types';
import { analyse } from './engine/analyse';

@Injectable()
export class AnalysisService {
  /**
   * Runs the engine. Whatever the DTO could not check (the order of the spectrum periods, a
   * modeCount above the storey count, values too extreme for double precision) the engine refuses
   * with a RangeError or TypeError that names the field; those are the caller's 400s.
   */
  analyse(request: AnalysisRequest): AnalysisResponse {
    try {
      return analyse(request);
    } catch (error) {
      if (error instanceof RangeError || error instanceof TypeError) {
        throw new BadRequestException([error.message]);
      }
      throw error;
    }
  }
}
