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
  all(): VerificationCaseResult[] {
    return REFERENCE_CASES.map(evaluateCase);
  }
}
