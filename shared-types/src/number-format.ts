/**
 * How numbers typed or pasted by people are read: with a decimal point ("1,234.5") or a decimal
 * comma ("1.234,5"), thousands grouped by the other mark or by spaces or apostrophes. One reading
 * for the browser's paste and the server's CSV import, so the two never disagree.
 *
 * Written here because the number parsers on npm read one locale at a time and none says whether
 * a cell such as "1,020" reads differently under the two conventions, which is what refusing an
 * ambiguous cell needs.
 */
export type DecimalMark = 'point' | 'comma';

/** Columns separated by a tab, a semicolon, a comma, or runs of spaces. */
export type Delimiter = 'tab' | 'semicolon' | 'comma' | 'space';

export const DELIMITER_CHARACTERS: Readonly<Record<Exclude<Delimiter, 'space'>, string>> = {
  tab: '\t',
  semicolon: ';',
  comma: ',',
};

/** In words, for the "read as" line: "decimal comma", "columns separated by semicolons". */
export const DECIMAL_MARK_WORDS: Readonly<Record<DecimalMark, string>> = {
  point: 'decimal point (1,234.5)',
  comma: 'decimal comma (1.234,5)',
};
export const DELIMITER_WORDS: Readonly<Record<Delimiter, string>> = {
  tab: 'tabs',
  semicolon: 'semicolons',
  comma: 'commas',
  space: 'spaces',
};

// Thousands may be grouped by the other mark, a space (plain, no-break, thin or narrow no-break)
// or an apostrophe; one kind of separator per number, groups of three.
const GROUP = "[ \\u00A0\\u2009\\u202F']";
const PATTERNS: Record<DecimalMark, RegExp> = {
  point: new RegExp(
    `^([-+]?)(\\d+|\\d{1,3}(,|${GROUP})\\d{3}(?:\\3\\d{3})*)?(?:\\.(\\d*))?(?:[eE]([-+]?\\d+))?$`,
  ),
  comma: new RegExp(
    `^([-+]?)(\\d+|\\d{1,3}(\\.|${GROUP})\\d{3}(?:\\3\\d{3})*)?(?:,(\\d*))?(?:[eE]([-+]?\\d+))?$`,
  ),
};

/** The number a cell holds when written with this decimal mark, or null if it is not one. */
export function readNumber(text: string, decimal: DecimalMark): number | null {
  const match = PATTERNS[decimal].exec(text.trim());
  if (!match) return null;
  const [, sign, whole = '', , fraction = '', exponent] = match;
  const digits = whole.replace(/\D/g, '');
  if (digits === '' && fraction === '') return null;
  const value = Number(`${sign}${digits || '0'}.${fraction || '0'}e${exponent ?? '0'}`);
  return Number.isFinite(value) ? value : null;
}

/**
 * What a cell tells about the decimal mark: `point` or `comma` when it reads only one way,
 * `either` when it reads both ways as different numbers ("1,020" is 1020 or 1.02), `same` when
 * both ways agree ("640", "780 000"), `neither` when it is no
 * number at all.
 */
export function decimalEvidence(text: string): DecimalMark | 'either' | 'same' | 'neither' {
  const point = readNumber(text, 'point');
  const comma = readNumber(text, 'comma');
  if (point !== null && comma !== null) return point === comma ? 'same' : 'either';
  if (point !== null) return 'point';
  if (comma !== null) return 'comma';
  return 'neither';
}

/**
 * The decimal mark the cells show: the only one any cell settles, or where cells settle both,
 * the one more of them settle (the others are then not numbers under it, and are named as such).
 * Null where no cell settles it: then every `either` cell is ambiguous.
 */
export function detectDecimalMark(cells: Iterable<string>): DecimalMark | null {
  let point = 0;
  let comma = 0;
  for (const cell of cells) {
    const evidence = decimalEvidence(cell);
    if (evidence === 'point') point += 1;
    else if (evidence === 'comma') comma += 1;
  }
  if (point === 0 && comma === 0) return null;
  return comma > point ? 'comma' : 'point';
}

/**
 * The column separator of a block of lines: a tab if every line has one, else a semicolon, else a
 * comma (each counted outside double quotes), else `fallback`.
 */
export function detectDelimiter(lines: readonly string[], fallback: Delimiter): Delimiter {
  const every = (character: string) =>
    lines.length > 0 && lines.every((line) => line.replace(/"[^"]*"/g, '').includes(character));
  if (every('\t')) return 'tab';
  if (every(';')) return 'semicolon';
  if (every(',')) return 'comma';
  return fallback;
}

/**
 * A cell read as a number under the given mark (or, with `null`, a mark not yet settled), or why
 * not, in words that say how it was read.
 */
export function numberUnder(
  text: string,
  decimal: DecimalMark | null,
): { value: number } | { problem: string } {
  const trimmed = text.trim();
  const shown = trimmed.length > 40 ? `${trimmed.slice(0, 40)}...` : trimmed;
  if (trimmed === '') return { problem: 'the cell is empty' };
  if (decimal === null) {
    const evidence = decimalEvidence(trimmed);
    if (evidence === 'either') {
      return {
        problem: `"${shown}" reads as ${readNumber(trimmed, 'point')} with a decimal point or ${readNumber(trimmed, 'comma')} with a decimal comma: choose how to read numbers`,
      };
    }
    const value = readNumber(trimmed, evidence === 'comma' ? 'comma' : 'point');
    return value === null ? { problem: `"${shown}" is not a number` } : { value };
  }
  const value = readNumber(trimmed, decimal);
  if (value !== null) return { value };
  const other = readNumber(trimmed, decimal === 'point' ? 'comma' : 'point');
  return {
    problem:
      other === null
        ? `"${shown}" is not a number`
        : `"${shown}" is not a number written with a ${decimal === 'point' ? 'decimal point' : 'decimal comma'}`,
  };
}
