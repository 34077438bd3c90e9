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
  return (
    <div aria-busy={busy}>
      <label className="flex items-center gap-2 font-semibold">
        <input
          type="checkbox"
          checked={model.shared}
          disabled={busy}
          aria-describedby="share-hint"
          onChange={(e) => void change({ shared: e.currentTarget.checked })}
        />
        Share with every account
      </label>
      <p id="share-hint" className="mt-1 text-sm text-ink-soft">
        {model.shared
          ? 'Shared: every teacher sees this model in their list and in the kit builder.'
          : 'Not shared: only its owner and staff see it.'}
      </p>
      <FormAlert kind="error" message={error} />
    </div>
  );
}
