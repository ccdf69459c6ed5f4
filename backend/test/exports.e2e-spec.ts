import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import type { CalculationDto, CalculationExport } from '@tiermode/shared-types';
import { binaryBody, sampleInputs, useSignedInApp } from './support/fixtures';

const { http, as } = useSignedInApp();

describe('Exports', () => {
  let projectId: string;
  let calc: CalculationDto;

  beforeAll(async () => {
    projectId = (await http().post('/api/projects').set(as('designer')).send({ name: 'Exports' }))
      .body.id;
    const inputs = sampleInputs();
    // Labels a spreadsheet would run as formulas, and one that is harmless.
    inputs.storeys[0].label = '=HYPERLINK("http://example.invalid","x")';
    inputs.storeys[1].label = '@SUM(A1)';
    inputs.storeys[2].label = 'Roof';
    const created = await http()
      .post(`/api/projects/${projectId}/calculations`)
      .set(as('designer'))
      .send({ title: 'Export me', inputs, displayUnits: 'US' })
      .expect(201);
    await http()
      .post(`/api/calculations/${created.body.id}/analyse`)
      .set(as('designer'))
      .expect(200);
    calc = (await http().get(`/api/calculations/${created.body.id}`).set(as('designer'))).body;
  });

  it('writes the modes as CSV, one row per mode, in the stated units', async () => {
    const res = await http()
      .get(`/api/calculations/${calc.id}/results.csv?table=modes`)
      .set(as('designer'))
      .expect(200)
      .expect('Content-Type', /text\/csv/)
      .expect('Content-Disposition', /Export-me-rev1-modes\.csv/);
    const rows = Papa.parse<string[]>(res.text.trim()).data;
    expect(rows[0]).toEqual(expect.arrayContaining(['Period (s)', 'Effective modal mass (t)']));
    expect(rows).toHaveLength(1 + calc.analysis!.modes.length);
    expect(Number(rows[1][1])).toBe(calc.analysis!.modes[0].period);
    expect(Number(rows[1][5])).toBeCloseTo(calc.analysis!.modes[0].effectiveMass / 1000, 9);
  });

  it('escapes text cells that a spreadsheet would read as formulas, in CSV and XLSX', async () => {
    const csv = await http()
      .get(`/api/calculations/${calc.id}/results.csv?table=combined`)
      .set(as('designer'))
      .expect(200);
    const rows = Papa.parse<string[]>(csv.text.trim()).data;
    const labels = rows.slice(1).map((r) => r[2]);
    expect(labels).toContain(`'=HYPERLINK("http://example.invalid","x")`);
    expect(labels).toContain(`'@SUM(A1)`);
    expect(labels).toContain('Roof');
    expect(labels.some((l) => /^[=+\-@]/.test(l))).toBe(false);
    // Base shear of CQC, in kN, as the API gives it in N.
    const base = rows.find((r) => r[0] === 'CQC' && r[1] === 'Base')!;
    expect(Number(base[6])).toBeCloseTo(calc.analysis!.combined.cqc.baseShear / 1000, 9);

    const xlsx = await http()
      .get(`/api/calculations/${calc.id}/results.xlsx`)
      .set(as('designer'))
      .buffer(true)
      .parse(binaryBody)
      .expect(200);
    const book = new ExcelJS.Workbook();
    await book.xlsx.load(xlsx.body as ExcelJS.Buffer);
    expect(book.worksheets.map((s) => s.name)).toEqual([
      'Modes',
      'Modal responses',
      'Combined responses',
      'About',
    ]);
    const modal = book.getWorksheet('Modal responses')!;
    expect(modal.getCell('C2').value).toBe(`'=HYPERLINK("http://example.invalid","x")`);
    expect(typeof modal.getCell('D2').value).toBe('number');
    expect(book.getWorksheet('About')!.getCell('A3').value).toBe('Preliminary: not locked');
  });

  it('refuses an unknown table, and results of a calc never analysed', async () => {
    const bad = await http()
      .get(`/api/calculations/${calc.id}/results.csv?table=everything`)
      .set(as('designer'))
      .expect(400);
    expect(bad.body.message).toEqual(['table must be one of modes, modal, combined']);
    const fresh = await http()
      .post(`/api/projects/${projectId}/calculations`)
      .set(as('designer'))
      .send({ title: 'Not analysed', inputs: sampleInputs() });
    const res = await http()
      .get(`/api/calculations/${fresh.body.id}/results.xlsx`)
      .set(as('designer'))
      .expect(409);
    expect(res.body.message).toEqual([
      'This calculation has not been analysed yet: nothing to export',
    ]);
  });

  it('exports the whole calc as JSON that re-imports to identical inputs', async () => {
    const exported = await http()
      .get(`/api/calculations/${calc.id}/export.json`)
      .set(as('designer'))
      .expect(200);
    const doc = exported.body as CalculationExport;
    expect(doc).toMatchObject({ format: 'tiermode-calculation', formatVersion: 1 });
    expect(doc.calculation.analysis).toEqual(calc.analysis);
    const imported = await http()
      .post(`/api/projects/${projectId}/calculations/import`)
      .set(as('designer'))
      .send(doc)
      .expect(201);
    expect(imported.body).toMatchObject({
      title: 'Export me',
      status: 'draft',
      revision: 1,
      displayUnits: 'US',
      analysis: null,
    });
    expect(imported.body.inputs).toEqual(calc.inputs);
    expect(imported.body.id).not.toBe(calc.id);
  });

  it.each([
    [
      { format: 'other', formatVersion: 1, calculation: {} },
      'format must be "tiermode-calculation"',
    ],
    [
      { format: 'tiermode-calculation', formatVersion: 2, calculation: {} },
      'formatVersion must be 1',
    ],
    [
      {
        format: 'tiermode-calculation',
        formatVersion: 1,
        calculation: { title: 'x', inputs: { ...sampleInputs(), dampingRatio: 2 } },
      },
      'calculation.inputs.dampingRatio',
    ],
  ])('refuses a document that is not an export, naming the field (%#)', async (body, message) => {
    const res = await http()
      .post(`/api/projects/${projectId}/calculations/import`)
      .set(as('designer'))
      .send(body)
      .expect(400);
    expect((res.body.message as string[]).join(' ')).toContain(message);
  });
});
