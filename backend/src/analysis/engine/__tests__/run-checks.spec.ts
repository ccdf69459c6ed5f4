import type { ChecksRequest } from '@tiermode/shared-types';
import { runChecks } from '../checks/run-checks';
import { uniformBuilding } from './buildings';

// An invented six-storey frame, soft at storey 2, on an ASCE 7-22 basis (values invented).
function request(storey2Stiffness: number): ChecksRequest {
  const storeys = uniformBuilding(6, 4e5, 4e8, 3.5);
  storeys[1] = { ...storeys[1], stiffness: storey2Stiffness };
  return {
    storeys,
    spectrum: {
      points: [
        { period: 0, sa: 0.4 },
        { period: 0.1, sa: 1 },
        { period: 0.6, sa: 1 },
        { period: 4, sa: 0.15 },
      ],
    },
    dampingRatio: 0.05,
    basis: {
      code: 'ASCE7-22',
      sds: 1,
      sd1: 0.6,
      s1: 0.5,
      tl: 8,
      r: 8,
      cd: 5.5,
      ie: 1,
      ct: 0.0466,
      x: 0.9,
      riskCategory: 'II',
    },
  };
}

describe('runChecks (ASCE 7-22 basis)', () => {
  it('fails the drift of a soft storey, flags it 1a/1b, and passes once the storey is stiffened', () => {
    const soft = runChecks(request(1.2e8)).checks;
    expect(soft.storeys[1].driftOk).toBe(false);
    expect(soft.irregularities.map((f) => `${f.type}@${f.storey}`)).toContain('1b@2');
    const stiffened = runChecks(request(4e8)).checks;
    expect(stiffened.storeys.every((s) => s.driftOk)).toBe(true);
    expect(stiffened.irregularities).toEqual([]);
  });

  it('scales the modal forces up to the ELF base shear where they fall short (12.9.1.4.1)', () => {
    const { checks } = runChecks(request(4e8));
    expect(checks.scaleFactor).toBeCloseTo(
      Math.max(1, checks.elf.baseShear / checks.modalBaseShear),
      12,
    );
    // The ELF forces add up to V (12.8.3: the Cvx sum to 1).
    const total = checks.storeys.reduce((sum, s) => sum + (s.elfForce ?? 0), 0);
    expect(total).toBeCloseTo(checks.elf.baseShear, 3);
    checks.storeys.forEach((s) =>
      expect(s.scaledShear).toBeCloseTo(s.modalShear * checks.scaleFactor, 6),
    );
  });
});
