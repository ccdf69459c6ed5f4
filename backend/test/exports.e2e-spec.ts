import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import type {
  CalculationDto,
  CalculationExport,
  WholeCalculationDto,
} from '@tiermode/shared-types';
import { ASCE_BASIS, binaryBody, sampleInputs, useSignedInApp } from './support/fixtures';

const { http, as } = useSignedInApp();

/** The results workbook of a calc, as the designer downloads it. */
async function workbookOf(id: string): Promise<ExcelJS.Workbook> {
  const xlsx = await http()
    .get(`/api/calculations/${id}/results.xlsx`)
    .set(as('designer'))
    .buffer(true)
    .parse(binaryBody)
    .expect(200);
  const book = new ExcelJS.Workbook();
  await book.xlsx.load(xlsx.body as ExcelJS.Buffer);
  return book;
}

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
      .get(`/api/calculations/${calc.id}/results.csv?table=modes&units=SI`)
      .set(as('designer'))
      .expect(200)
      .expect('Content-Type', /text\/csv/)
      .expect('Content-Disposition', /Export-me-rev1-modes\.csv/);
    const rows = Papa.parse<string[]>(res.text.trim()).data;
    expect(rows[0]).toEqual(expect.arrayContaining(['Period (s)', 'Effective modal mass (t)']));
    expect(rows).toHaveLength(1 + calc.analysis!.modes.length);
    // Six significant figures, not the binary tail of the double.
    expect(rows[1][1]).toBe(String(Number(calc.analysis!.modes[0].period.toPrecision(6))));
    expect(Number(rows[1][5])).toBe(
      Number((calc.analysis!.modes[0].effectiveMass / 1000).toPrecision(6)),
    );
    for (const row of rows.slice(1)) {
      for (const cell of row) {
        const digits = cell.replace(/^-?0*\.?0*/, '').replace(/[.e].*$|\./g, '');
        expect(digits.length).toBeLessThanOrEqual(6);
      }
    }
  });

  it("writes US customary units when asked, and the calc's own units by default", async () => {
    const us = async (query: string) =>
      Papa.parse<string[]>(
        (
          await http()
            .get(`/api/calculations/${calc.id}/results.csv?${query}`)
            .set(as('designer'))
            .expect(200)
        ).text.trim(),
      ).data;
    const modes = await us('table=modes&units=US');
    expect(modes[0]).toContain('Effective modal weight (kip)');
    // Weight = m g with g = 9.80665 m/s^2; 1 kip = 4448.2216152605 N (NIST SP 811, B.8).
    const kip = (calc.analysis!.modes[0].effectiveMass * 9.80665) / 4448.2216152605;
    expect(Number(modes[1][5])).toBe(Number(kip.toPrecision(6)));
    const combined = await us('table=combined&units=US');
    expect(combined[0]).toEqual(
      expect.arrayContaining([
        'Displacement (in)',
        'Storey shear (kip)',
        'Overturning moment (kip·ft)',
      ]),
    );
    const base = combined.find((r) => r[0] === 'CQC' && r[1] === 'Base')!;
    // 1 kip·ft = 4448.2216152605 N x 0.3048 m (NIST SP 811, B.8).
    const kipFt = calc.analysis!.combined.cqc.baseMoment / (4448.2216152605 * 0.3048);
    expect(Number(base[7])).toBe(Number(kipFt.toPrecision(6)));
    // The calc is kept in US units: without the query, the file is in them.
    expect(await us('table=combined')).toEqual(combined);
    const bad = await http()
      .get(`/api/calculations/${calc.id}/results.csv?table=modes&units=metric`)
      .set(as('designer'))
      .expect(400);
    expect(bad.body.message).toEqual(['units must be one of SI, US']);
  });

  it('escapes text cells that a spreadsheet would read as formulas, in CSV and XLSX', async () => {
    const csv = await http()
      .get(`/api/calculations/${calc.id}/results.csv?table=combined&units=SI`)
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
    expect(Number(base[6])).toBe(
      Number((calc.analysis!.combined.cqc.baseShear / 1000).toPrecision(6)),
    );

    const book = await workbookOf(calc.id);
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
    expect(bad.body.message).toEqual([
      'table must be one of modes, modal, combined, design, history',
    ]);
    const design = await http()
      .get(`/api/calculations/${calc.id}/results.csv?table=design`)
      .set(as('designer'))
      .expect(409);
    expect(design.body.message[0]).toContain('no current code-basis checks');
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

  it('exports the design storey values beside the elastic ones once the checks are made', async () => {
    const current = await http().get(`/api/calculations/${calc.id}`).set(as('designer'));
    await http()
      .patch(`/api/calculations/${calc.id}`)
      .set(as('designer'))
      .send({ version: current.body.version, basis: ASCE_BASIS })
      .expect(200);
    await http().post(`/api/calculations/${calc.id}/analyse`).set(as('designer')).expect(200);
    const checked = (await http().get(`/api/calculations/${calc.id}`).set(as('designer')))
      .body as CalculationDto;
    const rows = Papa.parse<string[]>(
      (
        await http()
          .get(`/api/calculations/${calc.id}/results.csv?table=design&units=SI`)
          .set(as('designer'))
          .expect(200)
      ).text.trim(),
    ).data;
    expect(rows[0]).toEqual(
      expect.arrayContaining(['Storey shear, elastic (kN)', 'Storey shear, design (kN)']),
    );
    const at = rows[0].indexOf('Storey shear, design (kN)');
    expect(Number(rows[1][at])).toBe(
      Number((checked.checks!.design!.storeyShear[0] / 1000).toPrecision(6)),
    );
    expect(Number(rows[1][at - 1])).toBe(
      Number((checked.analysis!.combined.cqc.storeyShear[0] / 1000).toPrecision(6)),
    );
    const book = await workbookOf(calc.id);
    expect(book.worksheets.map((w) => w.name)).toContain('Design storey values');
    // The calc is kept in US units: the workbook is in them.
    expect(book.getWorksheet('Design storey values')!.getRow(1).values).toContain(
      'Storey shear, design (kip)',
    );
  });

  it('exports the whole calc as JSON that re-imports to identical inputs', async () => {
    const exported = await http()
      .get(`/api/calculations/${calc.id}/export.json`)
      .set(as('designer'))
      .expect(200);
    const doc = exported.body as CalculationExport;
    expect(doc).toMatchObject({ format: 'tiermode-calculation', formatVersion: 1 });
    // The file of record carries the whole analysis, per-mode vectors and rho included.
    const whole = (
      await http().get(`/api/calculations/${calc.id}?detail=full`).set(as('designer')).expect(200)
    ).body as WholeCalculationDto;
    expect(doc.calculation.analysis).toEqual(whole.analysis);
    expect(doc.calculation.analysis?.correlation).toHaveLength(3);
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
