import { parseStoreyBlock, pasteIntoTable, storeyBlockText } from './paste';
import { toDisplay } from '@/lib/units';

const values = (text: string, options = {}) =>
  parseStoreyBlock(text, 'SI', options).rows.map((r) => [r.label, r.height, r.mass, r.stiffness]);

describe('parseStoreyBlock', () => {
  it('reads tab-separated rows with labels and headings, in SI units', () => {
    const text = 'Level\tHeight\tMass\tStiffness\nL1\t4.2\t420\t600000\nRoof\t3.6\t300\t360000\n';
    const { errors, readAs } = parseStoreyBlock(text, 'SI');
    expect(errors).toEqual([]);
    expect(readAs).toEqual({ delimiter: 'tab', decimal: 'point' });
    expect(values(text)).toEqual([
      ['L1', 4.2, 420_000, 6e8],
      ['Roof', 3.6, 300_000, 3.6e8],
    ]);
  });

  it('reads comma-separated rows without labels', () => {
    const { rows } = parseStoreyBlock('3.5, 250, 350000\n3.5, 250, 350000', 'SI');
    expect(rows).toHaveLength(2);
    expect(rows[1].mass).toBe(250_000);
  });

  it('converts US units: ft, kip of seismic weight, kip/in', () => {
    const { rows } = parseStoreyBlock('12\t1000\t2000', 'US');
    expect(rows[0].height).toBeCloseTo(3.6576, 10);
    expect(rows[0].mass).toBeCloseTo((1000 * 4448.2216152605) / 9.80665, 6);
    expect(rows[0].stiffness).toBeCloseTo(2000 * 175_126.835_246, 1);
  });

  // The grouping and decimal conventions below are those of spreadsheets in English and in
  // continental European locales (common practice; ISO 80000-1:2009 7.3.1 allows either mark
  // and groups of three digits, clause from memory).
  it('reads thousands separators where a decimal point settles the convention', () => {
    expect(values('Level 1\t4.5\t640\t780,000')).toEqual([['Level 1', 4.5, 640_000, 780_000_000]]);
    expect(values('Level 1\t4.5\t1,020\t780000')).toEqual([
      ['Level 1', 4.5, 1_020_000, 780_000_000],
    ]);
    expect(values("L1\t4.5\t1'020\t780 000")[0]).toEqual(['L1', 4.5, 1_020_000, 780_000_000]);
  });

  it('reads a European row with semicolons and a decimal comma, and says so', () => {
    const { rows, readAs, errors } = parseStoreyBlock('Niveau 1;4,5;640;780000', 'SI');
    expect(errors).toEqual([]);
    expect(readAs).toEqual({ delimiter: 'semicolon', decimal: 'comma' });
    expect([rows[0].height, rows[0].mass, rows[0].stiffness]).toEqual([4.5, 640_000, 780_000_000]);
    expect(values('N1;3,5;1.020;780.000,5')).toEqual([['N1', 3.5, 1_020_000, 780_000_500]]);
  });

  it('refuses a row whose cell count differs from the first row, naming the row', () => {
    const { rows, errors } = parseStoreyBlock(
      'Label,Height,Mass,Stiffness\nLevel 1,4.5,640,780000\nLevel 2,3.5,1,020,780000',
      'SI',
    );
    expect(rows).toHaveLength(1);
    expect(errors).toEqual([
      'Row 3: 5 cells where the headings have 4: a comma inside a number (a thousands separator or a decimal comma)? Separate the columns with tabs or semicolons',
    ]);
    expect(parseStoreyBlock('Level 1,4.5,1,020,780000', 'SI').errors[0]).toMatch(
      /^Row 1: 5 cell\(s\) separated by commas, where a storey has 3 or 4/,
    );
  });

  it('refuses a cell that reads two ways when nothing settles the convention, naming row and column', () => {
    const { rows, errors, readAs } = parseStoreyBlock('Level 1\t4\t640\t780,000', 'SI');
    expect(readAs.decimal).toBeNull();
    expect(rows).toEqual([]);
    expect(errors).toEqual([
      'Row 1, stiffness: "780,000" reads as 780000 with a decimal point or 780 with a decimal comma: choose how to read numbers',
    ]);
    // Chosen by the person, it reads.
    expect(values('Level 1\t4\t640\t780,000', { decimal: 'point' })).toEqual([
      ['Level 1', 4, 640_000, 780_000_000],
    ]);
    expect(values('Level 1\t4\t640\t780,000', { decimal: 'comma' })).toEqual([
      ['Level 1', 4, 640_000, 780_000],
    ]);
  });

  it('names a cell that is no number under the mark in use', () => {
    const { errors } = parseStoreyBlock('L1\t4.5\t640\t1000\nL2\t3,5\t640\t1000', 'SI');
    expect(errors).toEqual(['Row 2, height: "3,5" is not a number written with a decimal point']);
  });

  it('names the row and the field that cannot be read, and keeps the good rows', () => {
    const { rows, errors } = parseStoreyBlock(
      '3.5\t250\t350000\n3.5\tabc\t350000\n3.5\t250\t-1\n3.5\t250',
      'SI',
    );
    expect(rows).toHaveLength(1);
    expect(errors).toEqual([
      'Row 2, mass: "abc" is not a number',
      'Row 3, stiffness: -1 must be more than 0',
      'Row 4: 2 cells where the first row has 3: check the separators in this row',
    ]);
  });

  it('says so when nothing was pasted', () => {
    expect(parseStoreyBlock('  \n', 'SI').errors).toEqual(['No storeys found in the pasted text']);
  });

  it('reads the copied grid back to the same numbers', () => {
    const rows = [
      { id: 'a', label: 'Level 1', height: 4.35, mass: 723_012_267.123_456_7, stiffness: 1 / 3 },
      { id: 'b', label: 'Roof, east', height: 3.1, mass: 0.000_123_4, stiffness: 7.89e11 },
    ];
    for (const system of ['SI', 'US'] as const) {
      const text = storeyBlockText(rows, ['Label', 'Height', 'Mass', 'Stiffness'], (f, v) =>
        toDisplay(system, f === 'height' ? 'length' : f, v),
      );
      const back = parseStoreyBlock(text, system);
      expect(back.errors).toEqual([]);
      back.rows.forEach((row, i) => {
        expect(row.label).toBe(rows[i].label);
        for (const field of ['height', 'mass', 'stiffness'] as const) {
          // Exact to the last bit or one unit in the last place (the unit conversion's rounding).
          expect(Math.abs(row[field] - rows[i][field])).toBeLessThanOrEqual(
            2 * Number.EPSILON * Math.abs(rows[i][field]),
          );
        }
      });
    }
  });
});

describe('pasteIntoTable', () => {
  const table = [
    { id: 'a', label: 'L1', height: 4, mass: 4e5, stiffness: 6e8 },
    { id: 'b', label: 'L2', height: 3.5, mass: 4e5, stiffness: 5e8 },
  ];

  it('fills from the focused cell rightwards and upwards, adding storeys past the roof', () => {
    const { rows, errors } = pasteIntoTable(
      table,
      '410\t550,000\n390\t520,000.5\n300\t400000',
      { index: 1, field: 'mass' },
      'SI',
    );
    expect(errors).toEqual([]);
    expect(rows!.map((r) => [r.label, r.height, r.mass, r.stiffness])).toEqual([
      ['L1', 4, 4e5, 6e8],
      ['L2', 3.5, 410_000, 550_000_000],
      ['', 3.5, 390_000, 520_000_500],
      ['', 3.5, 300_000, 400_000_000],
    ]);
  });

  it('changes nothing when a cell cannot be read, and names it', () => {
    const { rows, errors } = pasteIntoTable(
      table,
      '4,5\t410\n3;5\t1',
      { index: 0, field: 'height' },
      'SI',
    );
    expect(rows).toBeNull();
    expect(errors).toEqual(['Row 2, height: "3;5" is not a number']);
    const wide = pasteIntoTable(table, '1\t2\t3', { index: 0, field: 'mass' }, 'SI');
    expect(wide.errors).toEqual([
      'Row 1: 3 cells from the mass column run past the stiffness column',
    ]);
  });
});

describe('"Copy the table" pasted back into the grid', () => {
  it('skips the headings line and lands every value where it came from', () => {
    const table = [
      { id: 'a', label: 'L1', height: 4.35, mass: 723_012_267.1234567, stiffness: 1 / 3 },
      { id: 'b', label: 'Roof', height: 3.1, mass: 2.5e5, stiffness: 7.89e11 },
    ];
    const text = storeyBlockText(
      table,
      ['Label', 'Height (m)', 'Mass (t)', 'Stiffness (kN/m)'],
      (f, v) => toDisplay('SI', f === 'height' ? 'length' : f, v),
    );
    const blank = table.map((r) => ({ ...r, label: '', height: 1, mass: 1, stiffness: 1 }));
    const { rows, errors } = pasteIntoTable(blank, text, { index: 0, field: 'label' }, 'SI');
    expect(errors).toEqual([]);
    rows!.forEach((row, i) => {
      expect(row.label).toBe(table[i].label);
      for (const field of ['height', 'mass', 'stiffness'] as const) {
        expect(Math.abs(row[field] - table[i][field])).toBeLessThanOrEqual(
          2 * Number.EPSILON * Math.abs(table[i][field]),
        );
      }
    });
  });
});
