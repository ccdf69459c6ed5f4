import {
  BadRequestException,
  Body,
  ConflictException,
  Controller,
  Get,
  Param,
  Post,
  Query,
  StreamableFile,
} from '@nestjs/common';
import type { CalculationDto, CalculationExport } from '@tiermode/shared-types';
import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import type { AppAbility } from '../authorization/app-ability';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { CurrentAbility, CurrentUser } from '../authorization/current.decorators';
import { CalculationsService } from '../calculations/calculations.service';
import { UuidParam } from '../common/pipes/uuid-param.pipe';
import type { User } from '../users/user.entity';
import { calcExport } from './calc-json';
import { ImportCalculationDto } from './dto/import-calculation.dto';
import { resultTables, type Table } from './results-tables';
import { spreadsheetSafe } from './spreadsheet-safe';
import { XLSX_TYPE } from '../imports/templates';
import { ApiContract } from '../openapi/api-contract.decorator';
import { Expensive } from '../rate-limit/expensive.decorator';

const TABLES = { modes: 0, modal: 1, combined: 2 } as const;

/** A file name from a title: letters, digits and dashes only. */
const fileName = (calc: CalculationDto, suffix: string) =>
  `${calc.title.replace(/[^A-Za-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'calculation'}-rev${calc.revision}-${suffix}`;

const safeRows = (table: Table) => table.rows.map((row) => row.map(spreadsheetSafe));

/** Results as CSV and XLSX, and the whole calc as JSON that imports back as a new draft. */
@Controller()
export class ExportsController {
  constructor(private readonly calculations: CalculationsService) {}

  private async analysed(ability: AppAbility, id: string) {
    const calc = await this.calculations.get(ability, id);
    if (!calc.analysis) {
      throw new ConflictException('This calculation has not been analysed yet: nothing to export');
    }
    return { calc, tables: resultTables(calc.inputs, calc.analysis) };
  }

  @ApiContract({
    summary: 'One results table as CSV (table=modes, modal or combined)',
    file: 'text/csv',
  })
  @Get('calculations/:id/results.csv')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  async resultsCsv(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
    @Query('table') table?: string,
  ): Promise<StreamableFile> {
    if (!table || !(table in TABLES)) {
      throw new BadRequestException(['table must be one of modes, modal, combined']);
    }
    const { calc, tables } = await this.analysed(ability, id);
    const chosen = tables[TABLES[table as keyof typeof TABLES]];
    const csv = Papa.unparse({ fields: chosen.headers, data: safeRows(chosen) }) + '\r\n';
    return new StreamableFile(Buffer.from(csv, 'utf8'), {
      type: 'text/csv; charset=utf-8',
      disposition: `attachment; filename="${fileName(calc, `${table}.csv`)}"`,
    });
  }

  @ApiContract({ summary: 'The results tables as an XLSX workbook', file: XLSX_TYPE })
  @Get('calculations/:id/results.xlsx')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  async resultsXlsx(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<StreamableFile> {
    const { calc, tables } = await this.analysed(ability, id);
    const workbook = new ExcelJS.Workbook();
    workbook.creator = 'Tiermode';
    for (const table of tables) {
      const sheet = workbook.addWorksheet(table.name);
      sheet.addRow(table.headers).font = { bold: true };
      safeRows(table).forEach((row) => sheet.addRow(row));
      sheet.columns.forEach((column) => (column.width = 18));
    }
    const about = workbook.addWorksheet('About');
    about.addRow([`${calc.title}, revision ${calc.revision} (${calc.status})`]);
    about.addRow([`Engine ${calc.engineVersion ?? ''}; analysed ${calc.analysedAt ?? ''}`]);
    about.addRow([calc.seal ? `Seal (SHA-256): ${calc.seal.hash}` : 'Preliminary: not locked']);
    about.addRow([
      'The locally adopted building code governs; the engineer of record must accept these results.',
    ]);
    return new StreamableFile(Buffer.from(await workbook.xlsx.writeBuffer()), {
      type: XLSX_TYPE,
      disposition: `attachment; filename="${fileName(calc, 'results.xlsx')}"`,
    });
  }

  @ApiContract({
    summary: 'The whole calc as JSON, re-importable as a new draft',
    returns: 'CalculationExport',
  })
  @Get('calculations/:id/export.json')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  async exportJson(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<CalculationExport> {
    return calcExport(await this.calculations.get(ability, id), new Date());
  }

  @ApiContract({
    summary: 'Import an exported calc as a new draft',
    body: 'CalculationExport',
    returns: 'CalculationDto',
  })
  @Post('projects/:id/calculations/import')
  @Expensive()
  @CheckPolicies((ability) => ability.can('create', 'Calculation'))
  importJson(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) projectId: string,
    @Body() body: ImportCalculationDto,
  ): Promise<CalculationDto> {
    const { title, inputs, displayUnits } = body.calculation;
    return this.calculations.create(ability, user, projectId, { title, inputs, displayUnits });
  }
}
