import type { z } from 'zod';
import type { runListResponseSchema } from '#shared/schemas/runs.ts';

export type ApprovedRun = z.infer<typeof runListResponseSchema>['items'][number];

export interface ModelGroup {
  modelId: string;
  label: string;
  category: string;
  runs: ApprovedRun[];
}

/** Approved runs grouped by model (a report covers one model), models by name, runs by serial then date. */
export function groupRunsByModel(runs: readonly ApprovedRun[]): ModelGroup[] {
  const groups = new Map<string, ModelGroup>();
  for (const run of runs) {
    const g = groups.get(run.unit.modelId) ?? { modelId: run.unit.modelId, label: `${run.unit.makerName} ${run.unit.modelName}`, category: run.unit.category, runs: [] };
    g.runs.push(run);
    groups.set(run.unit.modelId, g);
  }
  for (const g of groups.values()) g.runs.sort((a, b) => a.unit.serial.localeCompare(b.unit.serial) || a.measuredOn.localeCompare(b.measuredOn));
  return [...groups.values()].sort((a, b) => a.label.localeCompare(b.label, 'en'));
}
