import { Controller, Get } from '@nestjs/common';
import type { VerificationCaseResult } from '@tiermode/shared-types';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { VerificationService } from './verification.service';
import { ApiContract } from '../openapi/api-contract.decorator';

@Controller('verification')
export class VerificationController {
  constructor(private readonly verification: VerificationService) {}

  /** The reference cases, each with the values the running engine computes now. */
  @ApiContract({
    summary: 'The engine against published reference cases',
    returns: 'VerificationCaseResult[]',
  })
  @Get()
  @CheckPolicies((ability) => ability.can('read', 'Verification'))
  list(): VerificationCaseResult[] {
    return this.verification.all();
  }
}
