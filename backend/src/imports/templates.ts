import type { DisplayUnits } from '@tiermode/shared-types';
import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import { STOREY_COLUMNS, TEMPLATE_EXAMPLE } from './storey-table';

export const XLSX_TYPE = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

const rows = (units: DisplayUnits) => [
  STOREY_COLUMNS[units].map((c) => c.header),
  ...TEMPLATE_EXAMPLE[units],
];

/** The storey-table template as CSV: the headers the importer reads and an invented example. */
export function storeyTemplateCsv(units: DisplayUnits): string {
  return Papa.unparse(rows(units)) + '\r\n';
}

/** The same template as an XLSX workbook, with a note on the order of the rows. */
export async function storeyTemplateXlsx(units: DisplayUnits): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'Tiermode';
  const sheet = workbook.addWorksheet('Storeys');
  rows(units).forEach((row) => sheet.addRow(row));
  sheet.getRow(1).font = { bold: true };
  sheet.columns.forEach((column) => (column.width = 22));
  const notes = workbook.addWorksheet('Notes');
  notes.addRow([
    'Storey 1, at the base, is the first row under the headers; the roof is the last.',
  ]);
  notes.addRow([
    `Units: ${units === 'SI' ? 'SI (m, t, kN/m)' : 'US customary (ft, kip of seismic weight, kip/in)'}.`,
  ]);
  notes.addRow(['The example values are invented; replace them with the building’s own.']);
  return Buffer.from(await workbook.xlsx.writeBuffer());
}
