/**
 * One analysis endpoint as a TanStack Query mutation: POST JSON or CSV text to /api/analysis/<tool> and get
 * `{ result, savedResult }`, or an ApiError with the server's message and field errors. Each island is its
 * own React root, so the hook passes one module-level QueryClient instead of needing a provider per island.
 */
import { QueryClient, useMutation } from '@tanstack/react-query';
import { ApiError, api } from '../../lib/http/client';
import type { SavedResult } from '../../lib/analysis/saved-result';

export type AnalysisTool =
  | 'vibration'
  | 'thermal'
  | 'cleanroom'
  | 'magnetic'
  | 'psd-profile'
  | 'orbit-eclipse'
  | 'equilibrium-temperature'
  | 'four-point'
  | 'launch-stack'
  | 'deployment'
  | 'interference';

/** What the islands send: a JSON body, or CSV text with query options. */
export type AnalysisBody = { json: unknown } | { csv: string; query?: Record<string, string | number | undefined> };

export interface AnalysisAnswer<R> {
  result: R;
  savedResult: SavedResult;
}

// Analysis answers depend only on what was sent: nothing to cache or retry.
const queryClient = new QueryClient({ defaultOptions: { mutations: { retry: false } } });

/** A mutation for one tool; `mutate(body)` runs it, `data`, `error`, `isPending` describe the last run. */
export function useAnalysis<R>(tool: AnalysisTool) {
  return useMutation<AnalysisAnswer<R>, ApiError, AnalysisBody>(
    {
      mutationKey: ['analysis', tool],
      mutationFn: (body) =>
        'json' in body
          ? api<AnalysisAnswer<R>>(`/api/analysis/${tool}`, { method: 'POST', body: body.json })
          : api<AnalysisAnswer<R>>(`/api/analysis/${tool}`, {
              text: { contentType: 'text/csv', data: body.csv },
              query: body.query,
            }),
    },
    queryClient,
  );
}
