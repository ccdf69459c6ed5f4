import { BadRequestException } from '@nestjs/common';
import ExcelJS from 'exceljs';
import { DELIMITER_CHARACTERS, detectDelimiter, type Delimiter } from '@tiermode/shared-types';
import Papa from 'papaparse';
import { detectKind } from './file-checks';
import { unpackXlsx } from './xlsx-package';

/** The cells as text, and the separator a CSV file was read with (null for a workbook). */
export interface TableCells {
  cells: string[][];
  delimiter: Delimiter | null;
}

/**
 * The cells of an uploaded table as text, whichever format it came in: CSV (papaparse, with the
 * separator every line holds: tab, else semicolon, else comma) or the first sheet of an XLSX
 * workbook (exceljs), after the workbook's package has been checked. Anything else is refused,
 * whatever its name says.
 */
export async function readTable(bytes: Buffer): Promise<TableCells> {
  if (bytes.length === 0) throw new BadRequestException(['file is empty']);
  const kind = detectKind(bytes);
  if (kind === 'text') {
    const text = bytes.toString('utf8').replace(/^\uFEFF/, '');
    const lines = text.split(/\r\n|\n|\r/).filter((line) => line.trim() !== '');
    const delimiter = detectDelimiter(lines, 'comma');
    const parsed = Papa.parse<string[]>(text, {
      skipEmptyLines: false,
      delimiter: delimiter === 'space' ? ' ' : DELIMITER_CHARACTERS[delimiter],
    });
    return { cells: parsed.data.map((row) => row.map((cell) => String(cell ?? ''))), delimiter };
  }
  if (kind === 'xlsx') {
    const unpacked = await unpackXlsx(bytes);
    const workbook = new ExcelJS.Workbook();
    try {
      await workbook.xlsx.load(unpacked as unknown as ExcelJS.Buffer);
    } catch {
      throw new BadRequestException(['file is not a readable XLSX workbook']);
    }
    const sheet = workbook.worksheets[0];
    if (!sheet) throw new BadRequestException(['file has no worksheet']);
    const rows: string[][] = [];
    sheet.eachRow({ includeEmpty: true }, (row, number) => {
      const values = Array.isArray(row.values) ? row.values.slice(1) : [];
      rows[number - 1] = values.map(cellText);
    });
    return { cells: Array.from(rows, (row) => row ?? []), delimiter: null };
  }
  throw new BadRequestException([
    `file must be a CSV or XLSX table; this one is ${kind === 'unknown' ? 'neither' : `a ${kind.toUpperCase()} file`}`,
  ]);
}

/** A cell's value as the spreadsheet shows it: numbers exactly, formulas by their result. */
function cellText(value: ExcelJS.CellValue): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number' || typeof value === 'string' || typeof value === 'boolean') {
    return String(value);
  }
  if (value instanceof Date) return value.toISOString();
  if (typeof value === 'object' && 'result' in value) return cellText(value.result);
  if (typeof value === 'object' && 'richText' in value) {
    return value.richText.map((part) => part.text).join('');
  }
  if (typeof value === 'object' && 'text' in value) return String(value.text);
  return '';
}
