import { spreadsheetSafe } from './spreadsheet-safe';

describe('spreadsheetSafe (OWASP, "CSV Injection")', () => {
  it.each(['=1+1', '+1', '-1', '@SUM(A1)', '\tx', '\rx'])(
    'escapes the text %j with a leading apostrophe',
    (text) => expect(spreadsheetSafe(text)).toBe(`'${text}`),
  );

  it('leaves other text, numbers and empty cells alone', () => {
    expect(spreadsheetSafe('Roof')).toBe('Roof');
    expect(spreadsheetSafe('Level =2')).toBe('Level =2');
    expect(spreadsheetSafe(-1.5)).toBe(-1.5);
    expect(spreadsheetSafe(null)).toBeNull();
  });
});
