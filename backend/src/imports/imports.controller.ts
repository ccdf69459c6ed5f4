import {
  BadRequestException,
  Body,
  Controller,
  Get,
  HttpCode,
  Post,
  Query,
  StreamableFile,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import {
  DISPLAY_UNITS,
  type DecimalMark,
  type DisplayUnits,
  type ImportCellError,
  type SpectrumImportResponse,
  ACCELERATION_UNITS,
  type AccelerationUnits,
  type RecordImportResponse,
  type StoreyImportResponse,
} from '@tiermode/shared-types';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { readTable } from './read-table';
import { parseRecordTable } from './record-table';
import { parseSpectrumTable } from './spectrum-table';
import { parseStoreyTable } from './storey-table';
import { storeyTemplateCsv, storeyTemplateXlsx, XLSX_TYPE } from './templates';
import { uploadLimits } from './upload-limits.interceptor';
import { ApiContract } from '../openapi/api-contract.decorator';
import { Expensive } from '../rate-limit/expensive.decorator';

const TABLE_LIMIT = 2 * 1024 * 1024;

function unitsOf(value: unknown): DisplayUnits {
  if (value === undefined || value === '') return 'SI';
  if (typeof value === 'string' && (DISPLAY_UNITS as readonly string[]).includes(value)) {
    return value as DisplayUnits;
  }
  throw new BadRequestException(['units must be "SI" or "US"']);
}

/**
 * A result with problems leaves as a 400 that still carries the preview: what was read and
 * every problem, by row and column, so the user can fix the file (or the grid) without guessing.
 */
/** The upload's `decimal` field: how to read numbers, where the file does not settle it. */
function decimalOf(value: unknown): DecimalMark | undefined {
  if (value === undefined || value === '') return undefined;
  if (value === 'point' || value === 'comma') return value;
  throw new BadRequestException(['decimal must be "point" (1,234.5) or "comma" (1.234,5)']);
}

function refuseWithPreview<T extends { errors: ImportCellError[] }>(result: T): T {
  if (result.errors.length === 0) return result;
  throw new BadRequestException({
    ...result,
    statusCode: 400,
    error: 'Bad Request',
    message: result.errors.map((e) => `Row ${e.row}, ${e.column}: ${e.message}`),
  });
}

/** Storey tables in and templates out; nothing is stored, the user applies the result to a grid. */
@Controller('imports')
export class ImportsController {
  @ApiContract({
    summary: 'Read a storey table (CSV or XLSX); nothing is stored',
    returns: 'StoreyImportResponse',
    upload: {
      description: 'The table, and its units',
      fields: {
        units: { type: 'string', enum: ['SI', 'US'] },
        decimal: { type: 'string', enum: ['point', 'comma'] },
      },
    },
  })
  @Post('storeys')
  @Expensive()
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  @UseInterceptors(uploadLimits(TABLE_LIMIT, '2 MB'))
  async storeys(
    @UploadedFile() file: Express.Multer.File | undefined,
    @Body() body: Record<string, unknown>,
  ): Promise<StoreyImportResponse> {
    const units = unitsOf(body?.units);
    if (!file) throw new BadRequestException(['file must be a CSV or XLSX storey table']);
    return refuseWithPreview(
      parseStoreyTable(await readTable(file.buffer), units, decimalOf(body?.decimal)),
    );
  }

  @ApiContract({
    summary: 'Read a design spectrum table (CSV or XLSX); nothing is stored',
    returns: 'SpectrumImportResponse',
    upload: {
      description: 'The table of period and Sa',
      fields: { decimal: { type: 'string', enum: ['point', 'comma'] } },
    },
  })
  @Post('spectrum')
  @Expensive()
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  @UseInterceptors(uploadLimits(TABLE_LIMIT, '2 MB'))
  async spectrum(
    @UploadedFile() file: Express.Multer.File | undefined,
    @Body() body: Record<string, unknown>,
  ): Promise<SpectrumImportResponse> {
    if (!file) throw new BadRequestException(['file must be a CSV or XLSX table of period and Sa']);
    return refuseWithPreview(
      parseSpectrumTable(await readTable(file.buffer), decimalOf(body?.decimal)),
    );
  }

  @ApiContract({
    summary: 'Read a ground-motion record (CSV or plain text); nothing is stored',
    returns: 'RecordImportResponse',
    upload: {
      description:
        'One column of accelerations (give timeStep) or two columns, time (s) and acceleration; units as chosen',
      fields: {
        units: { type: 'string', enum: [...ACCELERATION_UNITS] },
        timeStep: { type: 'number' },
        decimal: { type: 'string', enum: ['point', 'comma'] },
      },
    },
  })
  @Post('record')
  @Expensive()
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  @UseInterceptors(uploadLimits(TABLE_LIMIT, '2 MB'))
  async record(
    @UploadedFile() file: Express.Multer.File | undefined,
    @Body() body: Record<string, unknown>,
  ): Promise<RecordImportResponse> {
    const units = body?.units;
    if (typeof units !== 'string' || !(ACCELERATION_UNITS as readonly string[]).includes(units)) {
      throw new BadRequestException([
        `units must be one of ${ACCELERATION_UNITS.join(', ')} (the record's accelerations)`,
      ]);
    }
    const step = body?.timeStep;
    const timeStep = step === undefined || step === '' ? undefined : Number(step);
    if (timeStep !== undefined && !(Number.isFinite(timeStep) && timeStep > 0)) {
      throw new BadRequestException(['timeStep must be a number of seconds greater than 0']);
    }
    if (!file) throw new BadRequestException(['file must be a CSV or text file of accelerations']);
    const name = (file.originalname || 'record').replace(/\.[^.]+$/, '').slice(0, 200) || 'record';
    return refuseWithPreview(
      parseRecordTable(await readTable(file.buffer), {
        units: units as AccelerationUnits,
        timeStep,
        decimal: decimalOf(body?.decimal),
        name,
      }),
    );
  }

  @ApiContract({ summary: 'The storey table template as CSV (units=SI or US)', file: 'text/csv' })
  @Get('storeys/template.csv')
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  templateCsv(@Query('units') units?: string): StreamableFile {
    const chosen = unitsOf(units);
    return new StreamableFile(Buffer.from(storeyTemplateCsv(chosen), 'utf8'), {
      type: 'text/csv; charset=utf-8',
      disposition: `attachment; filename="storey-table-template-${chosen}.csv"`,
    });
  }

  @ApiContract({ summary: 'The storey table template as XLSX (units=SI or US)', file: XLSX_TYPE })
  @Get('storeys/template.xlsx')
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  async templateXlsx(@Query('units') units?: string): Promise<StreamableFile> {
    const chosen = unitsOf(units);
    return new StreamableFile(await storeyTemplateXlsx(chosen), {
      type: XLSX_TYPE,
      disposition: `attachment; filename="storey-table-template-${chosen}.xlsx"`,
    });
  }
}
