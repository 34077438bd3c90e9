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

/**
 * CSV bodies: the shared client sends JSON only, so this posts text/csv and maps an error answer to the
 * same ApiError.
 */
async function csvPost<T>(
  path: string,
  csv: string,
  query: Record<string, string | number | undefined> = {},
): Promise<T> {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries(query)) if (v !== undefined && v !== '') params.set(k, String(v));
  let res: Response;
  try {
    res = await fetch(params.size ? `${path}?${params}` : path, {
      method: 'POST',
      headers: { 'content-type': 'text/csv' },
      body: csv,
      credentials: 'same-origin',
    });
  } catch {
    throw new ApiError(0, 'network', 'We could not reach Kitwright. Check your connection and try again.');
  }
  const data = (await res.json().catch(() => null)) as
    (T & { error?: { code?: string; message?: string; fields?: Record<string, string[]> } }) | null;
  if (res.ok && data) return data;
  const e = data?.error;
  throw new ApiError(res.status, e?.code ?? 'unknown', e?.message ?? `The server answered ${res.status}.`, e?.fields);
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
          : csvPost<AnalysisAnswer<R>>(`/api/analysis/${tool}`, body.csv, body.query),
    },
    queryClient,
  );
}
