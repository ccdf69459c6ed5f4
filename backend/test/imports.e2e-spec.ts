import JSZip from 'jszip';
import { lyingZipBomb } from './support/zip-bomb';
import type { StoreyImportResponse } from '@tiermode/shared-types';
import { binaryBody, sampleInputs, useSignedInApp } from './support/fixtures';

const { http, as } = useSignedInApp();

const upload = (bytes: Buffer | string, name: string, units = 'SI') =>
  http()
    .post('/api/imports/storeys')
    .set(as('designer'))
    .field('units', units)
    .attach('file', Buffer.from(bytes), name);

const messages = (body: { message: string[] }) => body.message.join('\n');

describe('POST /api/imports/storeys', () => {
  it('reads the SI CSV template back as the same storeys, in SI base units', async () => {
    const template = await http()
      .get('/api/imports/storeys/template.csv?units=SI')
      .set(as('designer'))
      .expect(200)
      .expect('Content-Type', /text\/csv/);
    const res = await upload(template.text, 'storeys.csv').expect(200);
    expect((res.body as StoreyImportResponse).storeys).toEqual([
      { label: 'Level 1', height: 4.2, mass: 420_000, stiffness: 600_000_000 },
      { label: 'Level 2', height: 3.6, mass: 400_000, stiffness: 540_000_000 },
      { label: 'Roof', height: 3.6, mass: 300_000, stiffness: 360_000_000 },
    ]);
  });

  it('reads the US XLSX template back, converting ft, kip of weight and kip/in to SI', async () => {
    const template = await http()
      .get('/api/imports/storeys/template.xlsx?units=US')
      .set(as('designer'))
      .buffer(true)
      .parse(binaryBody)
      .expect(200);
    const res = await upload(template.body as Buffer, 'storeys.xlsx', 'US').expect(200);
    const [first] = (res.body as StoreyImportResponse).storeys;
    // 1 ft = 0.3048 m; 1 kip = 4448.2216152605 N, / 9.80665 m/s^2 as a weight; 1 in = 0.0254 m
    // (NIST SP 811, appendix B).
    expect(first.label).toBe('Level 1');
    expect(first.height).toBeCloseTo(14 * 0.3048, 12);
    expect(first.mass).toBeCloseTo((925 * 4448.2216152605) / 9.80665, 6);
    expect(first.stiffness).toBeCloseTo((3400 * 4448.2216152605) / 0.0254, 3);
  });

  it('names the row and column of every bad cell, and still returns every row', async () => {
    const csv = [
      'Label,Height (m),Mass (t),Stiffness (kN/m)',
      'L1,4,350,520000',
      'L2,3.5,abc,480000',
      'L3,-3.5,340,450000',
      'Roof,3.5,,320000',
    ].join('\n');
    const res = await upload(csv, 'storeys.csv').expect(400);
    expect(res.body.errors).toEqual([
      { row: 3, column: 'Mass (t)', message: '"abc" is not a number' },
      { row: 4, column: 'Height (m)', message: '-3.5 must be more than 0' },
      { row: 5, column: 'Mass (t)', message: 'The cell is empty' },
    ]);
    expect(messages(res.body)).toContain('Row 3, Mass (t): "abc" is not a number');
    // Every row comes back, the unreadable cells as null, so they can be fixed in the grid.
    expect(res.body.storeys).toEqual([
      { label: 'L1', height: 4, mass: 350_000, stiffness: 520_000_000 },
      { label: 'L2', height: 3.5, mass: null, stiffness: 480_000_000 },
      { label: 'L3', height: null, mass: 340_000, stiffness: 450_000_000 },
      { label: 'Roof', height: 3.5, mass: null, stiffness: 320_000_000 },
    ]);
  });

  // Decimal and grouping conventions of English and continental European spreadsheets (common
  // practice; ISO 80000-1:2009 7.3.1 allows either decimal mark, clause from memory).
  it('reads a semicolon CSV with decimal commas, and says how it read it', async () => {
    const csv =
      'Label;Height (m);Mass (t);Stiffness (kN/m)\nNiveau 1;3,5;1.020;780.000\nNiveau 2;3,25;640;520000\n';
    const res = await upload(csv, 'storeys.csv').expect(200);
    expect(res.body.readAs).toEqual({ delimiter: 'semicolon', decimal: 'comma' });
    expect(res.body.storeys).toEqual([
      { label: 'Niveau 1', height: 3.5, mass: 1_020_000, stiffness: 780_000_000 },
      { label: 'Niveau 2', height: 3.25, mass: 640_000, stiffness: 520_000_000 },
    ]);
  });

  it('reads quoted thousands separators where a decimal point settles the convention', async () => {
    const csv = 'Label,Height (m),Mass (t),Stiffness (kN/m)\nL1,4.5,"1,020","780,000"\n';
    const res = await upload(csv, 'storeys.csv').expect(200);
    expect(res.body.readAs).toEqual({ delimiter: 'comma', decimal: 'point' });
    expect(res.body.storeys[0]).toEqual({
      label: 'L1',
      height: 4.5,
      mass: 1_020_000,
      stiffness: 780_000_000,
    });
  });

  it('refuses a row split by a comma inside a number, and an ambiguous cell, naming row and column', async () => {
    const split =
      'Label,Height (m),Mass (t),Stiffness (kN/m)\nL1,4.5,640,780000\nL2,3.5,1,020,780000\n';
    const res = await upload(split, 'storeys.csv').expect(400);
    expect(res.body.errors).toEqual([
      {
        row: 3,
        column: 'row',
        message:
          '5 cells where the header has 4: a comma inside a number (a thousands separator or a decimal comma)? Separate the columns with semicolons',
      },
    ]);
    const ambiguous = 'Label;Height (m);Mass (t);Stiffness (kN/m)\nL1;4;640;780.000\n';
    const refused = await upload(ambiguous, 'storeys.csv').expect(400);
    expect(refused.body.readAs.decimal).toBeNull();
    expect(refused.body.errors).toEqual([
      {
        row: 2,
        column: 'Stiffness (kN/m)',
        message:
          '"780.000" reads as 780 with a decimal point or 780000 with a decimal comma: choose how to read numbers',
      },
    ]);
    // Told how to read it, the same file reads.
    const told = await http()
      .post('/api/imports/storeys')
      .set(as('designer'))
      .field('units', 'SI')
      .field('decimal', 'comma')
      .attach('file', Buffer.from(ambiguous), 'storeys.csv')
      .expect(200);
    expect(told.body.storeys[0].stiffness).toBe(780_000_000);
    await http()
      .post('/api/imports/storeys')
      .set(as('designer'))
      .field('units', 'SI')
      .field('decimal', 'dot')
      .attach('file', Buffer.from(ambiguous), 'storeys.csv')
      .expect(400);
  });

  it.each([
    [
      'a missing column',
      'Label,Height (m),Mass (t)\nL1,4,350',
      'Row 1, Stiffness (kN/m): The column "Stiffness (kN/m)" is missing',
    ],
    [
      'a column in other units',
      'Label,Height (m),Mass (kg),Stiffness (kN/m)\nL1,4,350000,5',
      'Row 1, Mass (t): The column "Mass (kg)" is in kg, but the SI table takes t',
    ],
    [
      'headers but no storeys',
      'Label,Height (m),Mass (t),Stiffness (kN/m)\n',
      'Row 2, file: The table has headers but no storeys',
    ],
    ['an empty file', '', 'file is empty'],
    ['only blank lines', '\n\n \n', 'Row 1, file: The file has no rows'],
  ])('refuses %s with a message naming where', async (_what, csv, message) => {
    const res = await upload(csv, 'storeys.csv').expect(400);
    expect(messages(res.body)).toContain(message);
  });

  it('judges a file by its content, not its name', async () => {
    const png = Buffer.from('89504e470d0a1a0a0000000d49484452', 'hex');
    const renamed = await upload(png, 'storeys.csv').expect(400);
    expect(messages(renamed.body)).toContain(
      'file must be a CSV or XLSX table; this one is a PNG file',
    );
    const pdf = await upload('%PDF-1.7\n%\xe2\xe3', 'storeys.xlsx').expect(400);
    expect(messages(pdf.body)).toContain('this one is a PDF file');
    const binary = await upload(Buffer.from([0, 1, 2, 3, 0, 255]), 'storeys.csv').expect(400);
    expect(messages(binary.body)).toContain('this one is neither');
  });

  it('refuses a file over 2 MB, naming the limit', async () => {
    const big = 'Label,Height (m),Mass (t),Stiffness (kN/m)\n' + 'L,3,300,400000\n'.repeat(150_000);
    const res = await upload(big, 'storeys.csv').expect(400);
    expect(messages(res.body)).toContain('file must be at most 2 MB');
  });

  it('refuses a ZIP that is no workbook, one with too many parts, and one that unpacks too far', async () => {
    const notWorkbook = new JSZip();
    notWorkbook.file('readme.txt', 'hello');
    const a = await upload(await notWorkbook.generateAsync({ type: 'nodebuffer' }), 'storeys.xlsx');
    expect(a.status).toBe(400);
    expect(messages(a.body)).toContain('file is a ZIP archive but not an XLSX workbook');

    const many = new JSZip();
    many.file('[Content_Types].xml', '<Types/>');
    many.file('xl/workbook.xml', '<workbook/>');
    for (let i = 0; i < 600; i += 1) many.file(`xl/part${i}.xml`, '<x/>');
    const b = await upload(await many.generateAsync({ type: 'nodebuffer' }), 'storeys.xlsx');
    expect(messages(b.body)).toContain('has more than 500 parts');

    const bomb = new JSZip();
    bomb.file('[Content_Types].xml', '<Types/>');
    bomb.file('xl/workbook.xml', '<workbook/>');
    bomb.file('xl/worksheets/sheet1.xml', Buffer.alloc(30 * 1024 * 1024, 0x20));
    const packed = await bomb.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE' });
    expect(packed.length).toBeLessThan(2 * 1024 * 1024);
    const c = await upload(packed, 'storeys.xlsx');
    expect(c.status).toBe(400);
    expect(messages(c.body)).toContain('would unpack to more than 25 MB');

    // A directory that lies about the sizes once let 1.9 MB inflate to gigabytes in exceljs.
    const lying = await lyingZipBomb(60);
    expect(lying.length).toBeLessThan(2 * 1024 * 1024);
    const d = await upload(lying, 'storeys.xlsx');
    expect(d.status).toBe(400);
    expect(messages(d.body)).toContain(
      'file has a part larger than its directory says: it is not a storey table',
    );
  });

  it('refuses unknown units, a missing file and a second file', async () => {
    const units = await upload(
      'Label,Height (m),Mass (t),Stiffness (kN/m)\nL,3,1,1',
      'a.csv',
      'metric',
    );
    expect(units.status).toBe(400);
    expect(messages(units.body)).toBe('units must be "SI" or "US"');
    const none = await http().post('/api/imports/storeys').set(as('designer')).field('units', 'SI');
    expect(none.status).toBe(400);
    expect(messages(none.body)).toBe('file must be a CSV or XLSX storey table');
    const two = await http()
      .post('/api/imports/storeys')
      .set(as('designer'))
      .attach('file', Buffer.from('a'), 'a.csv')
      .attach('file', Buffer.from('b'), 'b.csv');
    expect(two.status).toBe(400);
    expect(messages(two.body)).toContain('upload one file, in the field "file"');
  });

  it('changes nothing already saved', async () => {
    const project = await http().post('/api/projects').set(as('designer')).send({ name: 'Upload' });
    const calc = await http()
      .post(`/api/projects/${project.body.id}/calculations`)
      .set(as('designer'))
      .send({ title: 'Kept', inputs: sampleInputs() })
      .expect(201);
    await upload('Label,Height (m)\nL,abc', 'bad.csv').expect(400);
    const after = await http().get(`/api/calculations/${calc.body.id}`).set(as('designer'));
    expect(after.body.inputs).toEqual(calc.body.inputs);
    expect(after.body.version).toBe(calc.body.version);
  });
});

describe('POST /api/imports/spectrum', () => {
  const send = (csv: string) =>
    http()
      .post('/api/imports/spectrum')
      .set(as('designer'))
      .attach('file', Buffer.from(csv), 'spectrum.csv');

  it('reads period and Sa points', async () => {
    const res = await send('Period (s),Sa (g)\n0,0.4\n0.15,1\n0.6,1\n4,0.15\n').expect(200);
    expect(res.body).toEqual({
      points: [
        { period: 0, sa: 0.4 },
        { period: 0.15, sa: 1 },
        { period: 0.6, sa: 1 },
        { period: 4, sa: 0.15 },
      ],
      errors: [],
      readAs: { delimiter: 'comma', decimal: 'point' },
    });
  });

  it('reads a semicolon table with decimal commas (the period 3,5 s is 3.5 s, not 35 s)', async () => {
    const res = await send('Period (s);Sa (g)\n0;0,4\n0,6;1\n3,5;0,171\n').expect(200);
    expect(res.body.points).toEqual([
      { period: 0, sa: 0.4 },
      { period: 0.6, sa: 1 },
      { period: 3.5, sa: 0.171 },
    ]);
    expect(res.body.readAs).toEqual({ delimiter: 'semicolon', decimal: 'comma' });
  });

  it.each([
    ['Period (s),Sa (g)\n0,0.4\n0.5,x\n', 'Row 3, Sa (g): "x" is not a number'],
    ['Period (s),Sa (g)\n0,0.4\n-1,0.5\n', 'Row 3, Period (s): -1 must be 0 or more'],
    [
      'Period (s),Sa (g)\n0,0.4\n0.5,1\n0.5,0.9\n',
      'Row 4, Period (s): 0.5 s must be more than the period above it (0.5 s)',
    ],
    ['Period (s),Sa (g)\n0,0.4\n', 'Row 2, file: A spectrum needs at least two points'],
    ['Period (s),Acceleration\n0,0.4\n', 'Row 1, Sa (g): The column "Sa (g)" is missing'],
    [
      'Period (ms),Sa (g)\n0,0.4\n1,1\n',
      'Row 1, Period (s): The column "Period (ms)" must be in s',
    ],
  ])('names the row and column of %j', async (csv, message) => {
    const res = await send(csv).expect(400);
    expect(messages(res.body)).toContain(message);
  });
});
