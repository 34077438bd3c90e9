import { useState } from 'react';
import { MESH_UNITS, type MeshUnit } from '../../lib/mesh/mesh-units';
import type { ImportedModelView } from '../../lib/models/imported-model-inputs';
import { MESH_UNIT_WORDS, meshSizeLabel } from '../../lib/ui/mesh-size-label';
import { FormAlert } from '../auth/FormAlert';
import { kitsLockedSentence, useModelChange } from './useModelChange';

interface Props {
  model: ImportedModelView;
  onChanged: (model: ImportedModelView) => void;
}

/**
 * The unit question: a mesh file holds bare numbers, so the teacher says what they are in. Each choice shows the
 * real size it makes of the model; the importer's guess is marked. Saved with a button, not on every arrow key.
 */
export default function ModelUnitChoice({ model, onChanged }: Props) {
  const [unit, setUnit] = useState<MeshUnit>(model.unit);
  const { change, busy, error } = useModelChange(model.id, onChanged);
  const [saved, setSaved] = useState<string | null>(null);
  const name = `unit-${model.id}`;
  const locked = model.kitCount > 0;
  const save = async () => {
    setSaved(null);
    if (await change({ unit })) setSaved(`Saved: the file’s numbers are ${MESH_UNIT_WORDS[unit]}.`);
  };
  return (
    <section className="card" aria-labelledby="unit-h">
      <h2 id="unit-h" className="text-lg font-bold">
        What are the file&rsquo;s numbers in?
      </h2>
      <p className="mt-1 text-sm text-ink-soft">
        A mesh file stores numbers without a unit. The sides of its box are {model.extents.map(fileNumber).join(' × ')}{' '}
        in the file; pick the unit that gives the real object its real size.
      </p>
      <fieldset className="mt-3" disabled={!model.canChange || locked || busy}>
        <legend className="sr-only">Unit of the file&rsquo;s numbers</legend>
        <ul className="flex flex-col gap-2">
          {MESH_UNITS.map((u) => (
            <li key={u}>
              <label className="flex items-baseline gap-2">
                <input
                  type="radio"
                  name={name}
                  value={u}
                  checked={unit === u}
                  onChange={() => {
                    setUnit(u);
                    setSaved(null);
                  }}
                />
                <span>
                  <span className="font-semibold">{MESH_UNIT_WORDS[u]}</span>: {meshSizeLabel(model.sizeByUnitM[u])}
                  {u === model.unitGuess && <span className="text-ink-soft"> (our guess from the size)</span>}
                </span>
              </label>
            </li>
          ))}
        </ul>
      </fieldset>
      {locked ? (
        <p className="mt-3 text-sm text-ink-soft">{kitsLockedSentence(model.kitCount)}</p>
      ) : model.canChange ? (
        <div className="mt-3 flex flex-wrap items-center gap-3">
          <button
            type="button"
            className="btn-secondary"
            disabled={busy || unit === model.unit}
            onClick={() => void save()}
          >
            {busy ? 'Saving…' : 'Use this unit'}
          </button>
          <p aria-live="polite" className="text-sm text-ink-soft">
            {unit !== model.unit ? `Now in ${MESH_UNIT_WORDS[model.unit]}; not saved yet.` : saved}
          </p>
        </div>
      ) : (
        <p className="mt-3 text-sm text-ink-soft">Only its owner or a coordinator can change the unit.</p>
      )}
      <div className="mt-2">
        <FormAlert kind="error" message={error} />
      </div>
    </section>
  );
}

function fileNumber(n: number): string {
  return new Intl.NumberFormat('en-US', { maximumSignificantDigits: 4 }).format(n);
}
