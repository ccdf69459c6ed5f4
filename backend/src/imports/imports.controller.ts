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
  type DisplayUnits,
  type StoreyImportResponse,
} from '@tiermode/shared-types';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { readTable } from './read-table';
import { parseStoreyTable } from './storey-table';
import { storeyTemplateCsv, storeyTemplateXlsx, XLSX_TYPE } from './templates';
import { uploadLimits } from './upload-limits.interceptor';

const TABLE_LIMIT = 2 * 1024 * 1024;

function unitsOf(value: unknown): DisplayUnits {
  if (value === undefined || value === '') return 'SI';
  if (typeof value === 'string' && (DISPLAY_UNITS as readonly string[]).includes(value)) {
    return value as DisplayUnits;
  }
  throw new BadRequestException(['units must be "SI" or "US"']);
}

/** Storey tables in and templates out; nothing is stored, the user applies the result to a grid. */
@Controller('imports/storeys')
export class ImportsController {
  @Post()
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  @UseInterceptors(uploadLimits(TABLE_LIMIT, '2 MB'))
  async storeys(
    @UploadedFile() file: Express.Multer.File | undefined,
    @Body() body: Record<string, unknown>,
  ): Promise<StoreyImportResponse> {
    const units = unitsOf(body?.units);
    if (!file) throw new BadRequestException(['file must be a CSV or XLSX storey table']);
    const { storeys, errors } = parseStoreyTable(await readTable(file.buffer), units);
    if (errors.length > 0) {
      // A 400 that still carries the preview: the rows that were read and every problem, by row
      // and column, so the user can fix the file (or the grid) without guessing.
      throw new BadRequestException({
        statusCode: 400,
        error: 'Bad Request',
        message: errors.map((e) => `Row ${e.row}, ${e.column}: ${e.message}`),
        storeys,
        errors,
      });
    }
    return { storeys, errors };
  }

  @Get('template.csv')
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  templateCsv(@Query('units') units?: string): StreamableFile {
    const chosen = unitsOf(units);
    return new StreamableFile(Buffer.from(storeyTemplateCsv(chosen), 'utf8'), {
      type: 'text/csv; charset=utf-8',
      disposition: `attachment; filename="storey-table-template-${chosen}.csv"`,
    });
  }

  @Get('template.xlsx')
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  async templateXlsx(@Query('units') units?: string): Promise<StreamableFile> {
    const chosen = unitsOf(units);
    return new StreamableFile(await storeyTemplateXlsx(chosen), {
      type: XLSX_TYPE,
      disposition: `attachment; filename="storey-table-template-${chosen}.xlsx"`,
    });
  }
}
