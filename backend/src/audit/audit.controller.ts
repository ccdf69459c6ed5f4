import { Controller, Get } from '@nestjs/common';
import type { AuditVerifyResponse } from '@tiermode/shared-types';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { AuditService } from './audit.service';
import { ApiContract } from '../openapi/api-contract.decorator';

@Controller('audit')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  /** Walks the whole trail and says whether every hash and link still holds. */
  @ApiContract({ summary: 'Check the whole audit hash chain', returns: 'AuditVerifyResponse' })
  @Get('verify')
  @CheckPolicies((ability) => ability.can('read', 'AuditTrail'))
  verify(): Promise<AuditVerifyResponse> {
    return this.audit.verify();
  }
}
