import { useState } from 'react';
import type { ImportedModelView } from '../../lib/models/imported-model-inputs';
import { FormAlert } from '../auth/FormAlert';
import { useModelChange } from './useModelChange';

interface Props {
  model: ImportedModelView;
  onChanged: (model: ImportedModelView) => void;
}

/** Coordinators and admins share a model with every account (teachers then find it in their list and builder). */
export default function ModelShareToggle({ model, onChanged }: Props) {
  const { change, busy, error } = useModelChange(model.id, onChanged);
  // Ticked at once, while the change is sent; the saved model's answer (or an error) settles it.
  const [pending, setPending] = useState<boolean | null>(null);
  const shared = pending ?? model.shared;
  const toggle = async (next: boolean) => {
    setPending(next);
    await change({ shared: next });
    setPending(null);
  };
  return (
    <div aria-busy={busy}>
      <label className="flex items-center gap-2 font-semibold">
        <input
          type="checkbox"
          checked={shared}
          disabled={busy}
          aria-describedby="share-hint"
          onChange={(e) => void toggle(e.currentTarget.checked)}
        />
        Share with every account
      </label>
      <p id="share-hint" className="mt-1 text-sm text-ink-soft">
        {busy
          ? 'Saving…'
          : model.shared
            ? 'Shared: every teacher sees this model in their list and in the kit builder.'
            : 'Not shared: only its owner and staff see it.'}
      </p>
      <FormAlert kind="error" message={error} />
    </div>
  );
}
