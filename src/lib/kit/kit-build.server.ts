/**
 * Server adapter: builds one output of a kit (SVG sheets, PDF, STL or JSON) through buildKit, refusing scales
 * at which a piece falls below the buildability floor (with the solver's message of what would work), timing each
 * stage, and caching the result by content hash. The build itself runs on the worker pool (src/lib/work).
 */
import { buildKit, GEOMETRY_KIT_ENGINE, type KitBuild, type KitEngine, type KitOutput } from './build-kit';
import { contentHash } from './content-hash';
import { kitScaleGuard } from './kit-scale-guard';
import { kitFonts } from './fonts.server';
import { workRun } from '../work/work-pool.server';
import type { KitRequest } from './kit-request';
import { KitCache } from './kit-cache.server';
import type { StageReport } from '../http/progress-lines';

/** Milliseconds spent in each stage the build went through, and in total. */
export type KitTimingsMs = Partial<Record<'patterns' | 'layout' | KitOutput, number>> & { total: number };

export interface KitOutputBuild {
  build: KitBuild;
  timingsMs: KitTimingsMs;
}

function guardedEngine(request: KitRequest): KitEngine {
  return {
    patterns: (model, options) => {
      const result = GEOMETRY_KIT_ENGINE.patterns(model, options);
      kitScaleGuard(request, result.pieces);
      return result;
    },
  };
}

const cache = new KitCache<KitOutputBuild>(({ build }) => {
  const files = (build.pdf?.byteLength ?? 0) + (build.stl?.byteLength ?? 0) + (build.json?.length ?? 0);
  return files + (build.svgSheets ?? []).reduce((sum, s) => sum + s.length, 0) + 50_000;
});

export interface KitOutputBuildOptions {
  /** Stops the build between stages when it fires (the client went away). */
  signal?: AbortSignal;
  /** Hears each stage as it ends, with its milliseconds; silent when the cache answers. */
  onStage?: StageReport;
}

/**
 * Builds one output now, on this thread, timing each stage: the task a pool worker runs (src/lib/work). Callers
 * go through kitOutputBuild, which caches and hands this to the pool.
 */
export async function kitOutputMake(
  request: KitRequest,
  output: KitOutput,
  options: KitOutputBuildOptions = {},
): Promise<KitOutputBuild> {
  const fonts = await kitFonts();
  const start = performance.now();
  let last = start;
  const timingsMs: KitTimingsMs = { total: 0 };
  const build = await buildKit(request, fonts, {
    engine: guardedEngine(request),
    outputs: [output],
    signal: options.signal,
    onProgress: (stage, fraction) => {
      if (fraction < 1) return;
      const now = performance.now();
      timingsMs[stage] = Math.round((now - last) * 10) / 10;
      last = now;
      options.onStage?.(stage, timingsMs[stage]);
    },
  });
  timingsMs.total = Math.round((performance.now() - start) * 10) / 10;
  return { build, timingsMs };
}

const isAbort = (err: unknown) => err instanceof Error && err.name === 'AbortError';

/** One output of a kit, built (or taken from the cache) from a parsed request; InputError when impossible. */
export async function kitOutputBuild(
  request: KitRequest,
  output: KitOutput,
  options: KitOutputBuildOptions = {},
): Promise<KitOutputBuild> {
  const hash = await contentHash(request);
  try {
    return await cache.get(`${hash}:${output}`, async () => {
      // On a worker thread of the pool (src/lib/work): the request's event loop keeps answering meanwhile.
      return (await workRun({ kind: 'kit-output', request, output }, options)) as KitOutputBuild;
    });
  } catch (err) {
    // This request joined a build whose own client cancelled it (the cache then forgets it): build anew.
    if (isAbort(err) && !options.signal?.aborted) return kitOutputBuild(request, output, options);
    throw err;
  }
}
