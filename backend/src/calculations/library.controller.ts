import { Controller, Get } from '@nestjs/common';
import type { LibraryEntryDto } from '@tiermode/shared-types';
import type { AppAbility } from '../authorization/app-ability';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { CurrentAbility } from '../authorization/current.decorators';
import { CalculationsService } from './calculations.service';

/** The calcs of record, which students read to learn from. */
@Controller('library')
export class LibraryController {
  constructor(private readonly calculations: CalculationsService) {}

  @Get()
  @CheckPolicies((ability) => ability.can('read', 'Library'))
  list(@CurrentAbility() ability: AppAbility): Promise<LibraryEntryDto[]> {
    return this.calculations.library(ability);
  }
}
