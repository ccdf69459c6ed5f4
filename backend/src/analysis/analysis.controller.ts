import { Body, Controller, HttpCode, Post, Query } from '@nestjs/common';
import type { AnalysisAnswer, ColumnStiffnessResponse } from '@tiermode/shared-types';
import { JsonAnswer } from '../common/json-answer';
import { parseAnalysisDetail } from './analysis-detail';
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
    summary:
      'Modal response spectrum analysis of a shear building (detail=full, the default, or summary: no per-mode storey vectors or correlation matrix)',
    query: 'AnalysisDetailQuery',
    body: 'AnalysisRequest',
    returns: 'AnalysisAnswer',
  })
  @Post()
  @Expensive()
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  async run(
    @Body() body: AnalysisRequestDto,
    @Query('detail') detail?: unknown,
  ): Promise<JsonAnswer<AnalysisAnswer>> {
    // The whole answer stays the default: api-contract.md fixes its fields for outside callers.
    const wanted = parseAnalysisDetail(detail, 'full');
    return new JsonAnswer(await this.analysis.answerJson(body, wanted));
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
