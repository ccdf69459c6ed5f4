import { Controller, Get, Query } from '@nestjs/common';
import type { CalculationSummaryDto, LibraryEntryDto } from '@tiermode/shared-types';
import type { AppAbility } from '../authorization/app-ability';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { CurrentAbility, CurrentUser } from '../authorization/current.decorators';
import type { User } from '../users/user.entity';
import { CalculationListsService } from './calculation-lists.service';
import { ListCalculationsDto } from './dto/list-calculations.dto';
import { ApiContract } from '../openapi/api-contract.decorator';

/** The calcs of record, which students read to learn from. */
@Controller('library')
export class LibraryController {
  constructor(private readonly lists: CalculationListsService) {}

  @ApiContract({
    summary: 'The library: calcs of record (locked and superseded)',
    returns: 'LibraryEntryDto[]',
  })
  @Get()
  @CheckPolicies((ability) => ability.can('read', 'Library'))
  list(@CurrentAbility() ability: AppAbility): Promise<LibraryEntryDto[]> {
    return this.lists.library(ability);
  }
}

/** Every calc the caller may read, filtered: the dashboard's and the project page's lists. */
@Controller('calculations')
export class CalculationListsController {
  constructor(private readonly lists: CalculationListsService) {}

  @ApiContract({
    summary: 'Calc summaries the caller may see, filtered',
    query: 'CalculationListQuery',
    returns: 'CalculationSummaryDto[]',
  })
  @Get()
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  list(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Query() query: ListCalculationsDto,
  ): Promise<CalculationSummaryDto[]> {
    return this.lists.list(ability, user, query);
  }
}
