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
import { asBadRequest } from './analysis.service';
import { FreeVibrationDto, RecordSpectrumDto, ResponseHistoryDto } from './dto/history.dto';
import { freeVibration } from './engine/history/free-vibration';
import { demoRecord, DEMO_RECORD_DESCRIPTION } from './engine/history/record';
import { recordSpectrum } from './engine/history/record-spectrum';
import { responseHistory } from './engine/history/response-history';

/**
 * Response history, stateless (any signed-in user; nothing is stored): free vibration, the
 * building under a ground-motion record, and a record's response spectrum. The engine checks
 * every value and names the field, sample or level; its refusals are 400s.
 */
@Controller()
export class HistoryController {
  @ApiContract({
    summary: 'Free vibration: the exact sum of the damped modal responses',
    body: 'FreeVibrationRequest',
    returns: 'FreeVibrationResponse',
  })
  @Post('free-vibration')
  @Expensive()
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  freeVibration(@Body() body: FreeVibrationDto): FreeVibrationResponse {
    return asBadRequest(() => freeVibration(body));
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
  responseHistory(@Body() body: ResponseHistoryDto): ResponseHistoryResponse {
    return asBadRequest(() => responseHistory(body));
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
  recordSpectrum(@Body() body: RecordSpectrumDto): RecordSpectrumResponse {
    return asBadRequest(() => recordSpectrum(body));
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
