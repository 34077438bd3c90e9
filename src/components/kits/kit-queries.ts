/**
 * Shared TanStack Query options and mutations for kits, used by the builder and the kits list alike, so a
 * query key means the same data everywhere. Types of answers come from the server modules (type-only).
 */
import { queryOptions, type QueryClient } from '@tanstack/react-query';
import { api, apiProgress, apiText } from '../../lib/http/client';
import type { StageReport } from '../../lib/http/progress-lines';
import type { KitPreview, ScaleSolution } from '../../lib/kit/kit-preview.server';
import type { KitForm } from '../../lib/kit/kit-settings';
import type { KitView } from '../../lib/kit/kit-view';

export type { KitPreview, ScaleSolution, KitView };

/** What the solver needs: everything of the form but the scale, title, copies and activity. */
export type ScaleSolveParams = Pick<
  KitForm,
  'modelId' | 'importId' | 'sheetSizeId' | 'paperGsm' | 'units' | 'venue' | 'gradeBand'
>;

/** Hears a build's progress: `begin` as a request starts, `stage` as the server finishes each stage. */
export interface BuildListener {
  begin(): void;
  stage: StageReport;
}

/**
 * Sheets and summary of unsaved settings; kept while newer settings build, never refetched by itself. With
 * a listener the build streams its stages (the key does not depend on it, so the cache is shared).
 */
export function kitPreviewQueryOptions(form: KitForm, listener?: BuildListener) {
  return queryOptions({
    queryKey: ['kit-preview', form] as const,
    queryFn: ({ signal }) => {
      if (!listener) return api<KitPreview>('/api/kits/preview', { body: form, signal });
      listener.begin();
      return apiProgress<KitPreview>('/api/kits/preview', { body: form, signal, onStage: listener.stage });
    },
    staleTime: Infinity,
    gcTime: 5 * 60_000,
  });
}

/** The solver's suggestion and explanations for a model, sheet, paper and venue. */
export function scaleSolveQueryOptions(params: ScaleSolveParams) {
  return queryOptions({
    queryKey: ['scale-solve', params] as const,
    queryFn: ({ signal }) => api<ScaleSolution>('/api/scale/solve', { body: params, signal }),
    staleTime: Infinity,
  });
}

/** The SVG sheets of a saved kit, in order: its first sheet carries the kit's own QR code. */
export function kitSheetsQueryOptions(kit: {
  id: string;
  contentHash: string;
  links: { svgSheets: readonly string[] };
}) {
  return queryOptions({
    queryKey: ['kit-sheets', kit.id, kit.contentHash] as const,
    queryFn: ({ signal }) => Promise.all(kit.links.svgSheets.map((url) => apiText(`${url}&inline=1`, { signal }))),
    staleTime: Infinity,
  });
}

/** The kits the caller may open, newest first. */
export function kitsListQueryOptions() {
  return queryOptions({
    queryKey: ['kits'] as const,
    queryFn: ({ signal }) => api<{ kits: KitView[] }>('/api/kits', { signal }).then((r) => r.kits),
  });
}

/** Saves settings to a class. */
export function kitSave(classId: string, form: KitForm): Promise<KitView> {
  return api<{ kit: KitView }>('/api/kits', { body: { classId, inputs: form } }).then((r) => r.kit);
}

/** Renames a kit. */
export function kitRenameRequest(id: string, title: string): Promise<KitView> {
  return api<{ kit: KitView }>(`/api/kits/${id}`, { method: 'PATCH', body: { title } }).then((r) => r.kit);
}

/** Copies a kit into the same class. */
export function kitDuplicateRequest(id: string): Promise<KitView> {
  return api<{ kit: KitView }>(`/api/kits/${id}/duplicate`, { method: 'POST' }).then((r) => r.kit);
}

/** Deletes a kit. */
export function kitDeleteRequest(id: string): Promise<void> {
  return api<unknown>(`/api/kits/${id}`, { method: 'DELETE' }).then(() => undefined);
}

/** Applies a change to the cached kits list and returns a function that undoes it (optimistic updates). */
export function kitsListOptimistic(client: QueryClient, change: (kits: KitView[]) => KitView[]): () => void {
  const key = kitsListQueryOptions().queryKey;
  const before = client.getQueryData(key);
  client.setQueryData(key, (kits: KitView[] | undefined) => change(kits ?? []));
  return () => client.setQueryData(key, before);
}
