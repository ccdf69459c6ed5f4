import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import type { ChecksResponse } from '@tiermode/shared-types';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { AnalysisService } from './analysis.service';
import { JsonAnswer } from '../common/json-answer';
import { ChecksRequestDto } from './dto/checks-request.dto';
import { ApiContract } from '../openapi/api-contract.decorator';
import { Expensive } from '../rate-limit/expensive.decorator';

/** The stateless code-basis checks: any signed-in user; nothing is stored. */
@Controller('checks')
export class ChecksController {
  constructor(private readonly analysis: AnalysisService) {}

  @ApiContract({
    summary: 'Analysis with the code-basis checks',
    body: 'ChecksRequest',
    returns: 'ChecksResponse',
  })
  @Post()
  @Expensive()
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  async run(@Body() body: ChecksRequestDto): Promise<JsonAnswer<ChecksResponse>> {
    return new JsonAnswer(await this.analysis.checksJson(body));
  }
}
