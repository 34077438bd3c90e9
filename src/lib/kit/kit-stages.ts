/**
 * The stages a kit build goes through, in order, with the words the builder shows for them. A build of one
 * output runs patterns, layout and then that output (build-kit.ts).
 */
import type { KitOutput, KitStage } from './build-kit';

export const KIT_STAGE_LABELS: Record<KitStage, string> = {
  patterns: 'Flat patterns',
  layout: 'Sheet layout',
  svg: 'Sheet drawings',
  pdf: 'PDF',
  stl: '3D-print mesh',
  json: 'Kit data',
};

/** The stages a build of `output` reports, in order. */
export function kitStagesOf(output: KitOutput): KitStage[] {
  return ['patterns', 'layout', output];
}

/** A stage the server reported as done, with its milliseconds. */
export interface KitStageDone {
  stage: string;
  ms: number;
}
