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
import {
  describeSpectrumSource,
  formatDateTime,
  type CalculationDto,
  type WholeCalculationDto,
  type CalculationExport,
} from '@tiermode/shared-types';
import { exportUnits } from './export-units';
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

const TABLES = ['modes', 'modal', 'combined', 'design', 'history'] as const;
type TableName = (typeof TABLES)[number];
const TABLE_NAMES: Record<TableName, string> = {
  modes: 'Modes',
  modal: 'Modal responses',
  combined: 'Combined responses',
  design: 'Design storey values',
  history: 'Response history peaks',
};

/** A file name from a title: letters, digits and dashes only. */
const fileName = (calc: WholeCalculationDto, suffix: string) =>
  `${calc.title.replace(/[^A-Za-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'calculation'}-rev${calc.revision}-${suffix}`;

const safeRows = (table: Table) => table.rows.map((row) => row.map(spreadsheetSafe));

/** Results as CSV and XLSX, and the whole calc as JSON that imports back as a new draft. */
@Controller()
export class ExportsController {
  constructor(private readonly calculations: CalculationsService) {}

  private async analysed(ability: AppAbility, id: string, units: string | undefined) {
    const calc = await this.calculations.getWhole(ability, id);
    if (!calc.analysis) {
      throw new ConflictException('This calculation has not been analysed yet: nothing to export');
    }
    // Checks and a response history older than the inputs are not exported.
    const checks = calc.analysisStale ? null : calc.checks;
    const history = calc.analysisStale ? null : calc.historyResults;
    const shown = exportUnits(units, calc);
    return {
      calc,
      shown,
      tables: resultTables(calc.inputs, calc.analysis, shown, checks, history),
    };
  }

  @ApiContract({
    summary:
      'One results table as CSV (table=modes, modal, combined, design or history; units=SI or US, default the calc’s own)',
    file: 'text/csv',
  })
  @Get('calculations/:id/results.csv')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  async resultsCsv(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
    @Query('table') table?: string,
    @Query('units') units?: string,
  ): Promise<StreamableFile> {
    if (!table || !TABLES.includes(table as TableName)) {
      throw new BadRequestException([`table must be one of ${TABLES.join(', ')}`]);
    }
    const { calc, tables } = await this.analysed(ability, id, units);
    const chosen = tables.find((t) => t.name === TABLE_NAMES[table as TableName]);
    if (!chosen) {
      throw new ConflictException(
        table === 'history'
          ? 'This calculation has no current response history: keep a record with it and analyse'
          : 'This calculation has no current code-basis checks, so no design values: set a basis and analyse',
      );
    }
    const csv = Papa.unparse({ fields: chosen.headers, data: safeRows(chosen) }) + '\r\n';
    return new StreamableFile(Buffer.from(csv, 'utf8'), {
      type: 'text/csv; charset=utf-8',
      disposition: `attachment; filename="${fileName(calc, `${table}.csv`)}"`,
    });
  }

  @ApiContract({
    summary: 'The results tables as an XLSX workbook (units=SI or US, default the calc’s own)',
    file: XLSX_TYPE,
  })
  @Get('calculations/:id/results.xlsx')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  async resultsXlsx(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
    @Query('units') units?: string,
  ): Promise<StreamableFile> {
    const { calc, tables, shown } = await this.analysed(ability, id, units);
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
    about.addRow([
      `Engine ${calc.engineVersion ?? ''}; analysed ${formatDateTime(calc.analysedAt)}`,
    ]);
    about.addRow([calc.seal ? `Seal (SHA-256): ${calc.seal.hash}` : 'Preliminary: not locked']);
    about.addRow([
      'The locally adopted building code governs; the engineer of record must accept these results.',
    ]);
    about.addRow([`Design spectrum: ${describeSpectrumSource(calc.inputs.spectrum.source)}`]);
    about.addRow([`Units: ${shown === 'US' ? 'US customary (kip, ft, in)' : 'SI (t, kN, m, mm)'}`]);
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
    return calcExport(await this.calculations.getWhole(ability, id), new Date());
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
    const { title, inputs, displayUnits, history } = body.calculation;
    return this.calculations.create(ability, user, projectId, {
      title,
      inputs,
      displayUnits,
      ...(history ? { history } : {}),
    });
  }
}
