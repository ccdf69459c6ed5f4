import { elevations, storeyProblems, type StoreyRow } from './storey-rows';

const row = (id: string, values: Partial<StoreyRow> = {}): StoreyRow => ({
  id,
  label: id,
  height: 3.5,
  mass: 2e5,
  stiffness: 3e8,
  ...values,
});

describe('storeyProblems', () => {
  it('names the storey (1 = the base) and the field of each bad cell', () => {
    const problems = storeyProblems([
      row('a'),
      row('b', { mass: -1 }),
      row('c', { height: Number.NaN, stiffness: 0 }),
    ]);
    expect(problems.map((p) => p.message)).toEqual([
      'Storey 2: mass must be a positive number',
      'Storey 3: height must be a positive number',
      'Storey 3: stiffness must be a positive number',
    ]);
    expect(problems[0]).toMatchObject({ rowId: 'b', field: 'mass' });
  });

  it('finds nothing wrong with a valid table', () => {
    expect(storeyProblems([row('a'), row('b')])).toEqual([]);
  });
});

describe('elevations', () => {
  it('sums the storey heights from the ground up', () => {
    expect(elevations([row('a', { height: 4 }), row('b'), row('c')])).toEqual([4, 7.5, 11]);
  });
});
