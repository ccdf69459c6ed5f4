import { parseStoreyBlock } from './paste';

describe('parseStoreyBlock', () => {
  it('reads tab-separated rows with labels and headings, in SI units', () => {
    const text = 'Level\tHeight\tMass\tStiffness\nL1\t4.2\t420\t600000\nRoof\t3.6\t300\t360000\n';
    const { rows, errors } = parseStoreyBlock(text, 'SI');
    expect(errors).toEqual([]);
    expect(rows.map((r) => [r.label, r.height, r.mass, r.stiffness])).toEqual([
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

  it('names the line and the field that cannot be read, and keeps the good lines', () => {
    const { rows, errors } = parseStoreyBlock(
      '3.5\t250\t350000\n3.5\tabc\t350000\n3.5\t250\t-1\n3.5\t250',
      'SI',
    );
    expect(rows).toHaveLength(1);
    expect(errors).toEqual([
      'Line 2: mass "abc" is not a positive number',
      'Line 3: stiffness "-1" is not a positive number',
      'Line 4: needs height, mass and stiffness (found 2 values)',
    ]);
  });

  it('says so when nothing was pasted', () => {
    expect(parseStoreyBlock('  \n', 'SI').errors).toEqual(['No storeys found in the pasted text']);
  });
});
