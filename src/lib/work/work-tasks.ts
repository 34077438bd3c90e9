/**
 * The CPU-heavy tasks the worker pool runs (work-pool.server.ts), by kind: what a task carries across the thread
 * boundary (structured-clone data only) and the function that does it. The same function runs on the request's
 * thread when there is no built worker (the dev server).
 */
import type { StageReport } from '../http/progress-lines';
import type { KitOutput } from '../kit/build-kit';
import { kitOutputMake } from '../kit/kit-build.server';
import type { KitRequest } from '../kit/kit-request';
import type { Model } from '../geometry/model-schema';
import type { UnitSystem } from '../layout/units';
import type { Venue } from '../layout/venues';
import type { SheetSizeId } from '../layout/sheet-sizes';
import { scaleExplain } from '../tools/scale-explain';
import { analysisRun, type AnalysisCall } from '../analysis/analysis-run';
import { meshImport } from '../mesh/mesh-prepare';
import type { MeshShape, ParsedMesh } from '../mesh/mesh-types';
import { meshSimplify } from '../mesh/mesh-simplify';
import { meshKitSummary, type MeshKitSummarySettings } from '../kit/mesh-kit-summary';
import {
  kitPatterns,
  kitScaleSolveCompute,
  type KitPatternsInput,
  type KitScaleSolveInput,
} from '../kit/kit-preview.server';

export type WorkTask =
  | { kind: 'kit-output'; request: KitRequest; output: KitOutput }
  | { kind: 'analysis'; call: AnalysisCall }
  | { kind: 'kit-patterns'; input: KitPatternsInput }
  | { kind: 'kit-scale-solve'; input: KitScaleSolveInput }
  | {
      kind: 'scale-explain';
      model: Model;
      req: { sheetId: SheetSizeId; paperGsm: number };
      venue: Venue;
      units: UnitSystem;
    }
  | { kind: 'mesh-import'; bytes: Uint8Array; fileName: string }
  | { kind: 'mesh-kit-summary'; shape: MeshShape; settings: MeshKitSummarySettings }
  | { kind: 'mesh-reduce'; mesh: ParsedMesh; targetTriangles: number };

/** Runs one task, reporting stages as they end; stops between stages when the signal fires. */
export function workTaskRun(task: WorkTask, onStage: StageReport, signal: AbortSignal): Promise<unknown> {
  switch (task.kind) {
    case 'kit-output':
      return kitOutputMake(task.request, task.output, { onStage, signal });
    case 'analysis':
      return Promise.resolve(analysisRun(task.call));
    case 'kit-patterns':
      return Promise.resolve(kitPatterns(task.input));
    case 'kit-scale-solve':
      return Promise.resolve(kitScaleSolveCompute(task.input));
    case 'mesh-import':
      return Promise.resolve(meshImport(task.bytes, task.fileName));
    case 'mesh-kit-summary':
      return Promise.resolve(meshKitSummary(task.shape, task.settings));
    case 'mesh-reduce':
      return meshSimplify(task.mesh, task.targetTriangles);
    case 'scale-explain':
      return Promise.resolve(scaleExplain(task.model, task.req, task.venue, task.units));
  }
}
