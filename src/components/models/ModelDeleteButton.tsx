import { useState } from 'react';
import { apiSettle } from '../../lib/http/client';
import type { ImportedModelView } from '../../lib/models/imported-model-inputs';
import { FormAlert } from '../auth/FormAlert';

/** Deletes a model after a confirmation and goes back to the list; the API refuses while saved kits use it. */
export default function ModelDeleteButton({ model }: { model: ImportedModelView }) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function remove() {
    if (!window.confirm(`Delete “${model.title}” and its file? This cannot be undone.`)) return;
    setBusy(true);
    setError(null);
    const result = await apiSettle<{ ok: true }>(`/api/models/imports/${model.id}`, { method: 'DELETE' });
    if (result.ok) return window.location.assign('/models/imports');
    setBusy(false);
    setError(result.error.message);
  }
  return (
    <div>
      <button
        type="button"
        className="btn-secondary"
        disabled={busy || model.kitCount > 0}
        aria-describedby={model.kitCount > 0 ? `delete-hint-${model.id}` : undefined}
        onClick={() => void remove()}
      >
        {busy ? 'Deleting…' : 'Delete this model'}
      </button>
      {model.kitCount > 0 && (
        <p id={`delete-hint-${model.id}`} className="mt-1 text-sm text-ink-soft">
          {model.kitCount === 1 ? '1 saved kit is' : `${model.kitCount} saved kits are`} built from it: delete{' '}
          {model.kitCount === 1 ? 'that kit' : 'those kits'} first.
        </p>
      )}
      <div className="mt-2">
        <FormAlert kind="error" message={error} />
      </div>
    </div>
  );
}
