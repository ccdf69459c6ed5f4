import type { WholeCalculationDto, CalculationExport } from '@tiermode/shared-types';

export const CALC_EXPORT_FORMAT = 'tiermode-calculation';
export const CALC_EXPORT_VERSION = 1;

/**
 * The whole calc as one JSON document: what was entered, what was computed, and, once locked,
 * the seal. `POST /api/projects/:id/calculations/import` reads it back into a new draft.
 */
export function calcExport(calc: WholeCalculationDto, exportedAt: Date): CalculationExport {
  return {
    format: CALC_EXPORT_FORMAT,
    formatVersion: CALC_EXPORT_VERSION,
    exportedAt: exportedAt.toISOString(),
    calculation: {
      title: calc.title,
      revision: calc.revision,
      status: calc.status,
      projectName: calc.projectName,
      author: calc.author.name,
      reviewer: calc.reviewer?.name ?? null,
      displayUnits: calc.displayUnits,
      inputs: calc.inputs,
      analysis: calc.analysis,
      engineVersion: calc.engineVersion,
      analysedAt: calc.analysedAt,
      seal: calc.seal,
      history: calc.history,
      historyResults: calc.historyResults,
      comments: calc.comments.map((c) => ({
        author: c.author.name,
        target: c.target,
        body: c.body,
        resolved: c.resolved,
        createdAt: c.createdAt,
      })),
    },
  };
}
