import { Injectable } from '@nestjs/common';
import type { VerificationCaseResult } from '@tiermode/shared-types';
import { ENGINE_VERSION } from '../analysis/engine/analyse';
import { REFERENCE_CASES, type ReferenceCase } from './reference-cases';

/** Runs one reference case on the engine as it is now. */
export function evaluateCase(reference: ReferenceCase): VerificationCaseResult {
  const rows = reference.values().map(({ quantity, expected, computed, tolerance }) => {
    const allowed = tolerance ?? reference.tolerance;
    const difference =
      expected === 0 ? Math.abs(computed) : Math.abs(computed - expected) / Math.abs(expected);
    return {
      quantity,
      expected,
      computed,
      difference,
      tolerance: allowed,
      pass: Number.isFinite(difference) && difference <= allowed,
    };
  });
  return {
    id: reference.id,
    title: reference.title,
    source: reference.source,
    inputs: reference.inputs,
    rows,
    pass: rows.every((row) => row.pass),
    engineVersion: ENGINE_VERSION,
  };
}

@Injectable()
export class VerificationService {
  private results: VerificationCaseResult[] | null = null;

  /**
   * Computed once per process: the engine and the cases are fixed while it runs, and the whole
   * list (a 500-storey building and a 60-digit reference among them) takes about 0.2 s of CPU,
   * which a page anyone signed in can reload should not cost the server each time.
   */
  all(): VerificationCaseResult[] {
    this.results ??= REFERENCE_CASES.map(evaluateCase);
    return this.results;
  }
}
