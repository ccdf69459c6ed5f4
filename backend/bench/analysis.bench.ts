/**
 * `npm run bench -w backend`: the full analysis (modes, spectral values, modal responses, SRSS,
 * CQC and ABS of every mode) for 10, 50, 200 and 500 storeys, after a warm-up, as one JSON line per
 * size with the median milliseconds; then the same through the naive path, a general dense
 * eigensolver (mathjs `eigs` on the full A = M^-1/2 K M^-1/2), as the ratio to beat.
 */
import type { MathJsInstance } from 'mathjs' with { 'resolution-mode': 'import' };
import { analyse } from '../src/analysis/engine/analyse';
import { naturalModes, modesFromEigenpairs, standardForm } from '../src/analysis/engine/modes';
import type { Storey } from '../src/analysis/engine/shear-building';
import { building, round, time } from './bench-support';

const SIZES = [10, 50, 200, 500];
/** The targets for the full analysis (issue 3): 200 storeys under 10 ms, 500 under 100 ms. */
const TARGET_MS: Record<number, number> = { 200: 10, 500: 100 };
const spectrum = {
  points: [
    { period: 0, sa: 0.4 },
    { period: 0.15, sa: 1 },
    { period: 0.6, sa: 1 },
    { period: 8, sa: 0.075 },
  ],
};

type Eigs = MathJsInstance['eigs'];

function denseModes(eigs: Eigs, storeys: readonly Storey[]) {
  const { a, b, rootMass } = standardForm(storeys);
  const n = a.length;
  const dense = a.map((d, i) =>
    a.map((_, j) => (i === j ? d : j === i + 1 ? b[i] : j === i - 1 ? b[j] : 0)),
  );
  const { eigenvectors } = eigs(dense);
  const pairs = eigenvectors
    .map((e) => ({ value: Number(e.value), vector: (e.vector as unknown as number[]).map(Number) }))
    .sort((x, y) => x.value - y.value);
  if (pairs.length !== n) throw new Error('mathjs returned too few eigenpairs');
  return modesFromEigenpairs(
    storeys,
    rootMass,
    pairs.map((p) => p.value),
    pairs.map((p) => p.vector),
  );
}

async function main(): Promise<void> {
  // mathjs ships its types as an ES module; a dynamic import keeps this file CommonJS.
  const { eigs } = await import('mathjs');
  // Every size through the engine first, as the server runs it; the naive path afterwards, since
  // it feeds the shared code other array types and would slow the engine's compiled code.
  const engine = SIZES.map((n) => {
    const storeys = building(n);
    const request = { storeys, spectrum, dampingRatio: 0.05 };
    const repetitions = n <= 50 ? 101 : n <= 200 ? 51 : 21;
    const fullMs = time(() => analyse(request), repetitions);
    const modesMs = time(() => naturalModes(storeys), repetitions);
    return { n, request, repetitions, fullMs, modesMs };
  });
  for (const { n, request, repetitions, fullMs, modesMs } of engine) {
    const naiveMs = time(
      () => analyse(request, (s) => denseModes(eigs, s)),
      n <= 50 ? 10 : 1,
      n <= 50 ? 3 : 0,
    );
    console.log(
      JSON.stringify({
        storeys: n,
        fullAnalysisMedianMs: round(fullMs),
        modesOnlyMedianMs: round(modesMs),
        naiveFullAnalysisMedianMs: round(naiveMs),
        naiveOverEngine: round(naiveMs / fullMs),
        repetitions,
        ...(TARGET_MS[n] ? { targetMs: TARGET_MS[n], meetsTarget: fullMs < TARGET_MS[n] } : {}),
      }),
    );
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
