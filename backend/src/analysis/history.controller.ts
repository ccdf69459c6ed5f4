import { Body, Controller, Get, HttpCode, Post } from '@nestjs/common';
import type {
  DemoRecordResponse,
  FreeVibrationResponse,
  RecordSpectrumResponse,
  ResponseHistoryResponse,
} from '@tiermode/shared-types';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { ApiContract } from '../openapi/api-contract.decorator';
import { Expensive } from '../rate-limit/expensive.decorator';
import { JsonAnswer } from '../common/json-answer';
import { AnalysisService } from './analysis.service';
import { FreeVibrationDto, RecordSpectrumDto, ResponseHistoryDto } from './dto/history.dto';
import { demoRecord, DEMO_RECORD_DESCRIPTION } from './engine/history/record';

/**
 * Response history, stateless (any signed-in user; nothing is stored): free vibration, the
 * building under a ground-motion record, and a record's response spectrum. The engine checks
 * every value and names the field, sample or level; its refusals are 400s.
 */
@Controller()
export class HistoryController {
  constructor(private readonly analysis: AnalysisService) {}

  @ApiContract({
    summary: 'Free vibration: the exact sum of the damped modal responses',
    body: 'FreeVibrationRequest',
    returns: 'FreeVibrationResponse',
  })
  @Post('free-vibration')
  @Expensive()
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  async freeVibration(@Body() body: FreeVibrationDto): Promise<JsonAnswer<FreeVibrationResponse>> {
    return new JsonAnswer(await this.analysis.freeVibrationJson(body));
  }

  @ApiContract({
    summary: 'Linear response history under a ground-motion record (modal superposition)',
    body: 'ResponseHistoryRequest',
    returns: 'ResponseHistoryResponse',
  })
  @Post('response-history')
  @Expensive()
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  async responseHistory(
    @Body() body: ResponseHistoryDto,
  ): Promise<JsonAnswer<ResponseHistoryResponse>> {
    return new JsonAnswer(await this.analysis.responseHistoryJson(body));
  }

  @ApiContract({
    summary: "A record's response spectrum (pseudo-acceleration and displacement)",
    body: 'RecordSpectrumRequest',
    returns: 'RecordSpectrumResponse',
  })
  @Post('record-spectrum')
  @Expensive()
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  async recordSpectrum(
    @Body() body: RecordSpectrumDto,
  ): Promise<JsonAnswer<RecordSpectrumResponse>> {
    return new JsonAnswer(await this.analysis.recordSpectrumJson(body));
  }

  @ApiContract({
    summary: 'The built-in demo record (invented, synthetic)',
    returns: 'DemoRecordResponse',
  })
  @Get('records/demo')
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  demo(): DemoRecordResponse {
    return { record: demoRecord(), description: DEMO_RECORD_DESCRIPTION };
  }
}
