import { useId } from 'react';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ApiError } from '../../lib/http/client';
import { kitSave, kitsListOptimistic, type KitView } from './kit-queries';
import type { KitForm } from '../../lib/kit/kit-settings';

interface Props {
  classes: { id: string; name: string }[];
  /** The class chosen to save to, and a new choice (the builder follows its grade band). */
  classId: string;
  onClassChange: (classId: string) => void;
  form: KitForm | null;
  modelTitle: string;
  sheetCount: number;
  onSaved: (kit: KitView | null) => void;
}

/** Saves the current settings to one of the teacher's classes; the kits list shows the kit at once (optimistic). */
export default function SaveKitPanel({
  classes,
  classId,
  onClassChange,
  form,
  modelTitle,
  sheetCount,
  onSaved,
}: Props) {
  const client = useQueryClient();
  const id = useId();
  const save = useMutation({
    mutationFn: (vars: { classId: string; form: KitForm }) => kitSave(vars.classId, vars.form),
    onMutate: (vars) => {
      onSaved(null);
      const now = new Date().toISOString();
      const name = classes.find((c) => c.id === vars.classId)?.name ?? '';
      const optimistic = {
        id: `pending-${now}`,
        title: vars.form.title ?? modelTitle,
        classId: vars.classId,
        className: name,
        sheetCount,
        createdAt: now,
      } as KitView;
      return { undo: kitsListOptimistic(client, (kits) => [optimistic, ...kits]) };
    },
    onError: (_err, _vars, context) => context?.undo(),
    onSuccess: (kit) => onSaved(kit),
    onSettled: () => client.invalidateQueries({ queryKey: ['kits'] }),
  });

  if (classes.length === 0) {
    return (
      <p className="text-sm text-ink-soft">
        Kits are saved to a class. <a href="/classes">Create a class</a> to save this kit for your students.
      </p>
    );
  }
  const className = classes.find((c) => c.id === save.variables?.classId)?.name;
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end gap-3">
        <div>
          <label className="field-label" htmlFor={`${id}-class`}>
            Save to class
          </label>
          <select
            id={`${id}-class`}
            className="field-input"
            value={classId}
            onChange={(e) => onClassChange(e.target.value)}
          >
            {classes.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
          </select>
        </div>
        <button
          type="button"
          className="btn-primary"
          disabled={!form || save.isPending}
          onClick={() => form && save.mutate({ classId, form })}
        >
          {save.isPending ? 'Saving…' : 'Save kit'}
        </button>
      </div>
      <div aria-live="polite" className="text-sm">
        {save.isPending && <p>Saving to {className}… it is already in your kits list.</p>}
        {save.isSuccess && (
          <p className="rounded-lg bg-fold-light p-3" data-testid="kit-saved">
            Saved to {save.data.className}. <a href={save.data.links.page}>Open the kit page</a> (its QR code points
            there) or <a href="/kits">see all your kits</a>.
          </p>
        )}
        {save.isError && (
          <p role="alert" className="text-danger">
            {save.error instanceof ApiError ? save.error.message : 'Saving failed; try again.'}
          </p>
        )}
      </div>
    </div>
  );
}
