import { useRef, useState } from 'react';
import { QueryClient, QueryClientProvider, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { ApiError } from '../../lib/http/client';
import { KIT_TITLE_MAX_LENGTH } from '../../lib/kit/kit-settings';
import {
  kitDeleteRequest,
  kitDuplicateRequest,
  kitRenameRequest,
  kitsListOptimistic,
  kitsListQueryOptions,
  type KitView,
} from './kit-queries';

interface Props {
  /** The kits the page read on the server (first data). */
  initialKits: KitView[];
  /** The teacher's classes, in order, so empty classes show too. */
  classes: { id: string; name: string }[];
  /** Whether the viewer may change kits (their teacher). */
  canEdit: boolean;
}

/** A teacher's kits per class, with thumbnails, rename, duplicate and delete (confirmed in a dialog). */
export default function KitsList(props: Props) {
  const [client] = useState(() => {
    const c = new QueryClient({ defaultOptions: { queries: { refetchOnWindowFocus: false, staleTime: 30_000 } } });
    c.setQueryData(kitsListQueryOptions().queryKey, props.initialKits);
    return c;
  });
  return (
    <QueryClientProvider client={client}>
      <KitsByClass {...props} />
    </QueryClientProvider>
  );
}

function KitsByClass({ classes, canEdit }: Props) {
  const kits = useQuery(kitsListQueryOptions());
  const [error, setError] = useState<string | null>(null);
  const [deleting, setDeleting] = useState<KitView | null>(null);
  const dialog = useRef<HTMLDialogElement>(null);
  const client = useQueryClient();
  const fail = (err: unknown, undo?: () => void) => {
    undo?.();
    setError(err instanceof ApiError ? err.message : 'That did not work; try again.');
  };
  const settle = () => client.invalidateQueries({ queryKey: ['kits'] });
  const rename = useMutation({
    mutationFn: (v: { id: string; title: string }) => kitRenameRequest(v.id, v.title),
    onMutate: (v) => ({
      undo: kitsListOptimistic(client, (ks) => ks.map((k) => (k.id === v.id ? { ...k, title: v.title } : k))),
    }),
    onError: (err, _v, ctx) => fail(err, ctx?.undo),
    onSettled: settle,
  });
  const duplicate = useMutation({ mutationFn: kitDuplicateRequest, onError: (err) => fail(err), onSettled: settle });
  const remove = useMutation({
    mutationFn: (kit: KitView) => kitDeleteRequest(kit.id),
    onMutate: (kit) => ({ undo: kitsListOptimistic(client, (ks) => ks.filter((k) => k.id !== kit.id)) }),
    onError: (err, _v, ctx) => fail(err, ctx?.undo),
    onSettled: settle,
  });

  const all = kits.data ?? [];
  const groups =
    classes.length > 0
      ? classes
      : [...new Map(all.map((k) => [k.classId, { id: k.classId, name: k.className }])).values()];
  const askDelete = (kit: KitView) => {
    setDeleting(kit);
    dialog.current?.showModal();
  };

  return (
    <div className="flex flex-col gap-8">
      {error && (
        <p role="alert" className="rounded-lg border border-danger/40 bg-danger-light p-3 text-danger">
          {error}
        </p>
      )}
      {kits.isError && <p role="alert">We could not load your kits: {(kits.error as Error).message}</p>}
      {groups.length === 0 && (
        <p>
          No kits yet. <a href="/kits/new">Build your first kit</a>.
        </p>
      )}
      {groups.map((c) => {
        const inClass = all.filter((k) => k.classId === c.id);
        return (
          <section key={c.id} aria-labelledby={`class-${c.id}`}>
            <h2 id={`class-${c.id}`} className="text-xl font-bold">
              {c.name}
            </h2>
            {inClass.length === 0 ? (
              <p className="mt-2 text-ink-soft">No kits for this class yet.</p>
            ) : (
              <ul className="mt-3 grid gap-4 sm:grid-cols-3 lg:grid-cols-4">
                {inClass.map((k) => (
                  <KitCard
                    key={k.id}
                    kit={k}
                    canEdit={canEdit}
                    onRename={(title) => rename.mutate({ id: k.id, title })}
                    onDuplicate={() => duplicate.mutate(k.id)}
                    onDelete={() => askDelete(k)}
                  />
                ))}
              </ul>
            )}
          </section>
        );
      })}
      <dialog
        ref={dialog}
        aria-labelledby="delete-kit-h"
        className="rounded-card p-6 backdrop:bg-ink/40"
        onClose={() => setDeleting(null)}
      >
        <form method="dialog">
          <h2 id="delete-kit-h" className="text-lg font-bold">
            Delete “{deleting?.title}”?
          </h2>
          <p className="mt-2 max-w-sm">
            Its page and QR code stop working for {deleting?.className}. Printed sheets keep working as paper.
          </p>
          <div className="mt-4 flex justify-end gap-2">
            <button value="cancel" className="btn-secondary" autoFocus>
              Keep it
            </button>
            <button
              value="delete"
              className="btn bg-danger text-white hover:bg-danger/90"
              onClick={() => deleting && remove.mutate(deleting)}
            >
              Delete kit
            </button>
          </div>
        </form>
      </dialog>
    </div>
  );
}

interface CardProps {
  kit: KitView;
  canEdit: boolean;
  onRename: (title: string) => void;
  onDuplicate: () => void;
  onDelete: () => void;
}

function KitCard({ kit, canEdit, onRename, onDuplicate, onDelete }: CardProps) {
  const [editing, setEditing] = useState(false);
  const pending = kit.id.startsWith('pending-');
  return (
    <li className="card flex flex-col gap-3 p-4" data-testid="kit-card" aria-busy={pending}>
      <a href={pending ? undefined : kit.links?.page} className="block rounded border border-ink/10 bg-white">
        {pending ? (
          <div className="flex aspect-[17/22] items-center justify-center text-sm text-ink-soft">Saving…</div>
        ) : (
          <img
            src={`${kit.links.svgSheets[0]}&inline=1`}
            alt={`First sheet of ${kit.title}`}
            loading="lazy"
            className="aspect-[17/22] w-full object-contain"
            width="170"
            height="220"
          />
        )}
      </a>
      {editing ? (
        <form
          className="flex gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            const title = String(new FormData(e.currentTarget).get('title') ?? '').trim();
            if (title) onRename(title);
            setEditing(false);
          }}
        >
          <label className="sr-only" htmlFor={`title-${kit.id}`}>
            New title
          </label>
          <input
            id={`title-${kit.id}`}
            name="title"
            defaultValue={kit.title}
            maxLength={KIT_TITLE_MAX_LENGTH}
            className="field-input mt-0"
            autoFocus
          />
          <button className="btn-primary px-3 py-1 text-sm">Save</button>
        </form>
      ) : (
        <h3 className="font-bold">{pending ? kit.title : <a href={kit.links.page}>{kit.title}</a>}</h3>
      )}
      {!pending && (
        <p className="text-sm text-ink-soft">
          {kit.modelTitle} · 1:{kit.scaleDenominator} · {kit.sheetCount} {kit.sheetCount === 1 ? 'sheet' : 'sheets'}
        </p>
      )}
      {!pending && !kit.engineCurrent && (
        <p className="rounded bg-caution-light p-2 text-xs" data-testid="engine-note">
          Saved with engine {kit.engineVersion}: the engine has changed since, so its sheets may differ a little.
        </p>
      )}
      {canEdit && !pending && (
        <div className="flex flex-wrap gap-2 text-sm">
          <button
            type="button"
            className="btn-secondary px-2 py-1 text-sm"
            onClick={() => setEditing(true)}
            aria-label={`Rename ${kit.title}`}
          >
            Rename
          </button>
          <button
            type="button"
            className="btn-secondary px-2 py-1 text-sm"
            onClick={onDuplicate}
            aria-label={`Duplicate ${kit.title}`}
          >
            Duplicate
          </button>
          <button
            type="button"
            className="btn-secondary px-2 py-1 text-sm text-danger"
            onClick={onDelete}
            aria-label={`Delete ${kit.title}`}
          >
            Delete
          </button>
        </div>
      )}
    </li>
  );
}
