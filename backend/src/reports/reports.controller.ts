import { Controller, Get, Param, Query, StreamableFile } from '@nestjs/common';
import type { AppAbility } from '../authorization/app-ability';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { CurrentAbility } from '../authorization/current.decorators';
import { CalculationsService } from '../calculations/calculations.service';
import { UuidParam } from '../common/pipes/uuid-param.pipe';
import { buildCalcPackage } from './calc-package';
import { exportUnits } from '../exports/export-units';
import { ApiContract } from '../openapi/api-contract.decorator';
import { Expensive } from '../rate-limit/expensive.decorator';

@Controller('calculations')
export class ReportsController {
  constructor(private readonly calculations: CalculationsService) {}

  /** The calc package as a PDF; a locked calc's comes from its sealed data, checked first. */
  @ApiContract({
    summary: 'The calc package PDF (units=SI or US, default the calc’s own)',
    file: 'application/pdf',
  })
  @Get(':id/report.pdf')
  @Expensive()
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  async report(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
    @Query('units') units?: string,
  ): Promise<StreamableFile> {
    const calc = await this.calculations.getWhole(ability, id);
    const shown = exportUnits(units, calc);
    const check = calc.seal ? await this.calculations.checkSeal(ability, id) : null;
    const pdf = await buildCalcPackage(calc, check, new Date(), shown);
    const name = calc.title.replace(/[^A-Za-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'calculation';
    return new StreamableFile(pdf, {
      type: 'application/pdf',
      disposition: `attachment; filename="${name}-rev${calc.revision}-calc-package.pdf"`,
    });
  }
}
