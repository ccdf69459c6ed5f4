/**
 * ASCE 7-22 Table 12.3-2, vertical structural irregularities read from the storey table
 * (storey 1 at the base): 1a soft storey, 1b extreme soft storey, 2 weight (mass). Thresholds as
 * method.md states them; the drift-ratio exception is 12.3.2.2 (from memory).
 */
export type VerticalIrregularityType = '1a' | '1b' | '2';

export interface VerticalIrregularity {
  type: VerticalIrregularityType;
  /** 1 = the base storey. */
  storey: number;
  /** The rule that caught it. */
  rule: string;
  message: string;
  clause: string;
  /** True where an exception applies: the flag stays in the list, with the reason. */
  excepted: boolean;
  exceptionReason?: string;
}

const TABLE = 'ASCE 7-22 Table 12.3-2';
const pct = (x: number) => `${(x * 100).toFixed(0)}%`;

function softStorey(
  k: readonly number[],
  i: number,
  type: '1a' | '1b',
  nextRatio: number,
  threeRatio: number,
): VerticalIrregularity | null {
  const words = type === '1a' ? 'Soft storey' : 'Extreme soft storey';
  const above = k[i + 1];
  if (above !== undefined && k[i] < nextRatio * above) {
    return {
      type,
      storey: i + 1,
      rule: `stiffness < ${pct(nextRatio)} of the storey above`,
      message: `${words} (${type}): storey ${i + 1} has ${pct(k[i] / above)} of the lateral stiffness of storey ${i + 2}, less than ${pct(nextRatio)}.`,
      clause: `${TABLE}, type ${type}`,
      excepted: false,
    };
  }
  if (i + 3 < k.length) {
    const average = (k[i + 1] + k[i + 2] + k[i + 3]) / 3;
    if (k[i] < threeRatio * average) {
      return {
        type,
        storey: i + 1,
        rule: `stiffness < ${pct(threeRatio)} of the average of the three storeys above`,
        message: `${words} (${type}): storey ${i + 1} has ${pct(k[i] / average)} of the average lateral stiffness of storeys ${i + 2}-${i + 4}, less than ${pct(threeRatio)}.`,
        clause: `${TABLE}, type ${type}`,
        excepted: false,
      };
    }
  }
  return null;
}

/**
 * The vertical irregularities of the storey table. An extreme soft storey (1b) is listed as 1b
 * only (it is also a 1a). Mass: a storey more than 150% of an adjacent one; a roof lighter than
 * the floor below is not compared. Where `driftRatios` are given and no storey's drift ratio is
 * more than 130% of the storey above's (the top two storeys not evaluated), 1a, 1b and 2 are
 * marked excepted (12.3.2.2).
 */
export function verticalIrregularities(
  stiffness: readonly number[],
  mass: readonly number[],
  driftRatios?: readonly number[],
): VerticalIrregularity[] {
  const n = stiffness.length;
  const found: VerticalIrregularity[] = [];
  for (let i = 0; i < n - 1; i += 1) {
    const flag =
      softStorey(stiffness, i, '1b', 0.6, 0.7) ?? softStorey(stiffness, i, '1a', 0.7, 0.8);
    if (flag) found.push(flag);
  }
  const roof = n - 1;
  for (let i = 0; i < n; i += 1) {
    const neighbours = [i - 1, i + 1].filter(
      (j) => j >= 0 && j < n && !(j === roof && mass[roof] < mass[roof - 1]),
    );
    // The roof itself, lighter than the floor below, is never the heavy storey either.
    const heavier = neighbours.find((j) => mass[i] > 1.5 * mass[j]);
    if (heavier !== undefined && !(i === roof && mass[roof] < mass[roof - 1])) {
      found.push({
        type: '2',
        storey: i + 1,
        rule: 'mass > 150% of an adjacent storey',
        message: `Weight (mass) irregularity (2): storey ${i + 1} has ${pct(mass[i] / mass[heavier])} of the mass of storey ${heavier + 1}, more than 150%.`,
        clause: `${TABLE}, type 2`,
        excepted: false,
      });
    }
  }
  if (driftRatios && found.length > 0) {
    const evaluated = Math.max(0, n - 2);
    let worst = 0;
    for (let i = 0; i < evaluated; i += 1) {
      worst = Math.max(worst, driftRatios[i] / driftRatios[i + 1]);
    }
    if (worst <= 1.3) {
      for (const flag of found) {
        flag.excepted = true;
        flag.exceptionReason = `No storey drift ratio is more than 130% of the storey above's (largest ${pct(worst)}; the top two storeys not evaluated), so ASCE 7-22 12.3.2.2 says this irregularity need not be considered.`;
      }
    }
  }
  return found;
}
