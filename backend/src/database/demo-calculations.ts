import type { EntityManager } from '@mikro-orm/knex';
import {
  defaultScalingRange,
  type CalculationInputs,
  type ResponseHistorySetup,
} from '@tiermode/shared-types';
import { analyse } from '../analysis/engine/analyse';
import { calcResponseHistory } from '../analysis/engine/history/calc-history';
import { demoRecord } from '../analysis/engine/history/record';
import { generateSpectrum } from '../analysis/engine/spectrum-generators';
import { appendAuditEvent } from '../audit/append-audit-event';
import type { SigningKey } from '../signing/signing-key';
import { Calculation } from '../calculations/calculation.entity';
import { Project } from '../projects/project.entity';
import { User } from '../users/user.entity';

/** A generated ASCE 7 spectrum as a calc stores it: the table, its interpolation and source. */
function asce7Spectrum(parameters: { sds: number; sd1: number; tl: number; s1: number }) {
  const { points, interpolation, source } = generateSpectrum({
    kind: 'asce7-two-period',
    ...parameters,
  });
  return { points, interpolation, source };
}

/** An invented firm's two buildings, with invented storey data (SI base units). */
function housingBlock(): CalculationInputs {
  // Seven-storey reinforced concrete housing block: a taller ground storey, a lighter roof.
  const masses = [640, 620, 620, 620, 610, 600, 470];
  const stiffness = [2.1, 1.9, 1.8, 1.7, 1.5, 1.3, 1.1];
  return {
    storeys: masses.map((t, i) => ({
      mass: t * 1000,
      stiffness: stiffness[i] * 1e9,
      height: i === 0 ? 4.0 : 3.1,
    })),
    spectrum: asce7Spectrum({ sds: 1.0, sd1: 0.6, tl: 8, s1: 0.6 }),
    dampingRatio: 0.05,
  };
}

/**
 * The housing block under the invented demo record, scaled to the mean of its design spectrum
 * over 0.2 T1 to 2 T1, and let go from its first mode with 50 mm at the roof: so that the
 * library's calc of record shows a response history too.
 */
function housingHistory(): ResponseHistorySetup {
  const firstPeriod = analyse(housingBlock()).modes[0].period;
  const [from, to] = defaultScalingRange(firstPeriod);
  return {
    record: demoRecord(),
    scaling: { method: 'spectrum', rule: 'mean', periodRange: [+from.toFixed(3), +to.toFixed(3)] },
    freeVibration: {
      start: { kind: 'mode', mode: 1, amplitude: 0.05 },
      duration: 5,
      timeStep: 0.01,
    },
  };
}

function laboratory(): CalculationInputs {
  // Twelve-storey steel-framed laboratory: heavy plant floors, stiffness tapering up the height.
  return {
    storeys: Array.from({ length: 12 }, (_, i) => ({
      mass: (i === 0 ? 900 : i === 11 ? 620 : 860) * 1000,
      stiffness: (1.4 - (0.8 * i) / 11) * 1e9,
      height: i === 0 ? 4.5 : 3.8,
    })),
    spectrum: asce7Spectrum({ sds: 0.8, sd1: 0.45, tl: 6, s1: 0.4 }),
    dampingRatio: 0.05,
  };
}

/**
 * The demo's projects and calcs, on a freshly seeded demo database: the housing block's calc is
 * locked (it is in the library), the laboratory's east-west calc is submitted for review, and a
 * north-south draft of the laboratory waits for its code-basis checks. Each step is on the
 * audit trail, as if done through the app.
 */
export async function seedDemoCalculations(em: EntityManager, key: SigningKey): Promise<void> {
  const designer = await em.findOneOrFail(User, { email: 'designer@tiermode.test' });
  const reviewer = await em.findOneOrFail(User, { email: 'reviewer@tiermode.test' });
  const start = Date.now() - 3 * 24 * 3600 * 1000;
  let minute = 0;
  const at = () => new Date(start + (minute += 7) * 60_000);

  const make = async (
    projectName: string,
    site: string,
    basis: Pick<Project, 'codeBasis' | 'structuralSystem'>,
    title: string,
    inputs: CalculationInputs,
    history: ResponseHistorySetup | null = null,
  ) => {
    const project = em.create(Project, { name: projectName, site, ...basis, createdBy: designer });
    project.members.add(designer);
    const result = analyse(inputs);
    const historyResults = history ? calcResponseHistory(inputs, history) : null;
    const created = at();
    const calc = em.create(Calculation, {
      project,
      title,
      inputs,
      author: designer,
      inputsChangedAt: created,
      analysis: result,
      history,
      historyResults,
      engineVersion: result.engineVersion,
      analysedAt: at(),
    });
    calc.submit(at());
    for (const [action, when] of [
      ['created', created],
      ['analysed', calc.analysedAt],
      ['submitted', calc.submittedAt],
    ] as const) {
      await appendAuditEvent(em, key, {
        calculationId: calc.id,
        actor: designer,
        action,
        at: when ?? created,
      });
      await em.flush();
    }
    return calc;
  };

  const housing = await make(
    'Alder Court housing block',
    'Invented: a level plot on stiff soil at the edge of an invented town',
    { codeBasis: 'EN1998-1', structuralSystem: 'Reinforced concrete walls' },
    'Lateral modal analysis, north-south',
    housingBlock(),
    housingHistory(),
  );
  const lockedAt = at();
  const seal = housing.lock(
    reviewer,
    'Accepted as the calc of record for the permit set (demo).',
    lockedAt,
    key,
  );
  await appendAuditEvent(em, key, {
    calculationId: housing.id,
    actor: reviewer,
    action: 'locked',
    detail: { sealHash: seal.hash, supersedes: null },
    at: lockedAt,
  });
  await em.flush();

  const lab = await make(
    'Quarry Lane laboratory',
    'Invented: a sloping former quarry site, on dense gravel',
    { codeBasis: 'ASCE7-22', structuralSystem: 'Steel moment frames' },
    'Lateral modal analysis, east-west',
    laboratory(),
  );

  // A draft the designer is still working on: the north-south frames, with a tall loading-dock
  // storey at the base that is much less stiff than the floors above (invented numbers).
  const dockStudy = laboratory();
  dockStudy.storeys[0] = { ...dockStudy.storeys[0], height: 6, stiffness: 0.15e9 };
  const created = at();
  const draft = em.create(Calculation, {
    project: lab.project,
    title: 'Loading-dock storey study, north-south',
    inputs: dockStudy,
    author: designer,
    inputsChangedAt: created,
  });
  await appendAuditEvent(em, key, {
    calculationId: draft.id,
    actor: designer,
    action: 'created',
    at: created,
  });
  await em.flush();
}
