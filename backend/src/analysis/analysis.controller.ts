import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import type { AnalysisResponse, ColumnStiffnessResponse } from '@tiermode/shared-types';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { AnalysisService } from './analysis.service';
import { AnalysisRequestDto } from './dto/analysis-request.dto';
import { ColumnStiffnessDto } from './dto/column-stiffness.dto';
import { ApiContract } from '../openapi/api-contract.decorator';
import { Expensive } from '../rate-limit/expensive.decorator';

/** The stateless analysis: any signed-in user; nothing is stored. */
@Controller('analysis')
export class AnalysisController {
  constructor(private readonly analysis: AnalysisService) {}

  @ApiContract({
    summary: 'Modal response spectrum analysis of a shear building',
    body: 'AnalysisRequest',
    returns: 'AnalysisResponse',
  })
  @Post()
  @Expensive()
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  run(@Body() body: AnalysisRequestDto): AnalysisResponse {
    return this.analysis.analyse(body);
  }

  /** A storey's lateral stiffness from its columns, for the storey table's helper. */
  @ApiContract({
    summary: 'Storey stiffness from column groups',
    body: 'ColumnStiffnessRequest',
    returns: 'ColumnStiffnessResponse',
  })
  @Post('column-stiffness')
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  columnStiffness(@Body() body: ColumnStiffnessDto): ColumnStiffnessResponse {
    return this.analysis.columnStiffness(body);
  }
}
