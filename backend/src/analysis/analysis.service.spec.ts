import { BadRequestException } from '@nestjs/common';
import type { AnalysisRequest } from '@tiermode/shared-types';
import { analysisAnswer } from './analysis-work';
import { AnalysisService } from './analysis.service';
import { analyse } from './engine/analyse';
import { randomBuilding, seededRandom } from './engine/__tests__/buildings';

// The first analysis on a worker starts the thread and, under Jest, compiles the engine there.
const TIMEOUT_MS = 60_000;

function request(storeys: number, seed = 7): AnalysisRequest {
  return {
    storeys: randomBuilding(storeys, seededRandom(seed)),
    spectrum: {
      points: [
        { period: 0, sa: 0.4 },
        { period: 0.5, sa: 1 },
        { period: 4, sa: 0.2 },
      ],
    },
    dampingRatio: 0.05,
  };
}

/** How many turns the event loop makes while `work` is awaited. */
async function loopTurnsDuring(work: () => Promise<unknown>): Promise<number> {
  let turns = 0;
  let running = true;
  const spin = () => {
    if (!running) return;
    turns += 1;
    setImmediate(spin);
  };
  setImmediate(spin);
  try {
    await work();
  } finally {
    running = false;
  }
  return turns;
}

describe('AnalysisService.answerJson', () => {
  const service = new AnalysisService();
  afterAll(() => service.onModuleDestroy());

  it(
    'answers from a worker with exactly the engine’s numbers, whole or summary',
    async () => {
      for (const storeys of [3, 60]) {
        const building = request(storeys);
        const whole = analyse(building);
        for (const detail of ['full', 'summary'] as const) {
          const bytes = await service.answerJson(building, detail);
          // Same text: every number to the last bit (JSON keeps the shortest exact form).
          expect(new TextDecoder().decode(bytes)).toBe(
            JSON.stringify(analysisAnswer(whole, detail)),
          );
        }
      }
    },
    TIMEOUT_MS,
  );

  it(
    'leaves this thread free while it analyses',
    async () => {
      const tall = request(300);
      await service.answerJson(tall, 'summary'); // the worker started and warm
      // On a worker the loop turns while it works (at least once, for the answer to come back);
      // on this thread the analysis would run to the end before the loop turned at all, as the
      // engine called here directly shows.
      expect(await loopTurnsDuring(() => service.answerJson(tall, 'summary'))).toBeGreaterThan(0);
      expect(await loopTurnsDuring(() => Promise.resolve(analyse(tall)))).toBe(0);
    },
    TIMEOUT_MS,
  );

  it(
    'turns what the engine refuses on a worker into a 400 naming the field',
    async () => {
      const tall = { ...request(45), modeCount: 46 };
      const refusal = service.answerJson(tall, 'summary');
      await expect(refusal).rejects.toBeInstanceOf(BadRequestException);
      await expect(refusal).rejects.toMatchObject({
        response: {
          message: ['modeCount must be a whole number from 1 to 45 (the number of storeys)'],
        },
      });
    },
    TIMEOUT_MS,
  );
});
