import { Controller, Get } from '@nestjs/common';
import type { MailMessageDto } from '@tiermode/shared-types';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { MailService } from './mail.service';
import { ApiContract } from '../openapi/api-contract.decorator';

@Controller('mail')
export class MailController {
  constructor(private readonly mail: MailService) {}

  /** What the local catcher received, and any message still queued or given up on. */
  @ApiContract({ summary: 'Mail sent and waiting (admin)', returns: 'MailMessageDto[]' })
  @Get('outbox')
  @CheckPolicies((ability) => ability.can('read', 'Outbox'))
  outbox(): Promise<MailMessageDto[]> {
    return this.mail.outbox();
  }
}
