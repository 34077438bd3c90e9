import { useState } from 'react';
import type { ImportedModelView } from '../../lib/models/imported-model-inputs';
import { FormAlert } from '../auth/FormAlert';
import FieldShell from '../tools/FieldShell';
import { kitsLockedSentence, useModelChange } from './useModelChange';

interface Props {
  model: ImportedModelView;
  onChanged: (model: ImportedModelView) => void;
}

const count = (n: number) => n.toLocaleString('en-US');

/**
 * Optional reduction: fewer, larger triangles for a finely modelled mesh (fewer pieces to cut). Shows the reduced
 * count beside the original and goes back to the full mesh on request.
 */
export default function ModelReduction({ model, onChanged }: Props) {
  const [target, setTarget] = useState(String(model.reducedTriangleCount ?? Math.ceil(model.triangleCount / 2)));
  const [fieldError, setFieldError] = useState<string | null>(null);
  const { change, busy, error } = useModelChange(model.id, onChanged);
  const reduced = model.reducedTriangleCount;

  const reduce = () => {
    const n = Number(target);
    if (!Number.isInteger(n) || n < 1) return setFieldError('Enter a whole number of triangles, such as 500.');
    if (n >= model.triangleCount)
      return setFieldError(`Enter fewer than the ${count(model.triangleCount)} triangles of the full mesh.`);
    setFieldError(null);
    void change({ reduceToTriangles: n });
  };

  return (
    <section className="card" aria-labelledby="reduce-h" aria-busy={busy}>
      <h2 id="reduce-h" className="text-lg font-bold">
        Fewer triangles (optional)
      </h2>
      <p className="mt-1 text-sm text-ink-soft">
        A finely modelled mesh makes many small pieces. Reducing it keeps the shape with fewer, larger faces.
      </p>
      <p className="mt-2" data-testid="triangle-counts">
        Full mesh: <strong>{count(model.triangleCount)}</strong> triangles
        {reduced !== null && (
          <>
            {' '}
            · in use: <strong>{count(reduced)}</strong> triangles (reduced)
          </>
        )}
      </p>
      {model.canChange && model.kitCount > 0 && (
        <p className="mt-2 text-sm text-ink-soft">{kitsLockedSentence(model.kitCount)}</p>
      )}
      {model.canChange && model.kitCount === 0 && (
        <>
          <div className="mt-3 flex flex-wrap items-end gap-3">
            <FieldShell label="Target number of triangles" error={fieldError ?? undefined}>
              {({ id, describedBy }) => (
                <input
                  id={id}
                  type="number"
                  min={1}
                  max={model.triangleCount - 1}
                  step={1}
                  className="field-input max-w-40"
                  value={target}
                  aria-invalid={fieldError ? true : undefined}
                  aria-describedby={describedBy}
                  onChange={(e) => setTarget(e.currentTarget.value)}
                  onKeyDown={(e) => e.key === 'Enter' && reduce()}
                />
              )}
            </FieldShell>
            <button type="button" className="btn-secondary" disabled={busy} onClick={reduce}>
              {busy ? 'Working…' : 'Reduce'}
            </button>
            {reduced !== null && (
              <button
                type="button"
                className="btn-secondary"
                disabled={busy}
                onClick={() => void change({ reduceToTriangles: null })}
              >
                Use the full mesh
              </button>
            )}
          </div>
          <p aria-live="polite" className="mt-2 text-sm text-ink-soft">
            {busy ? 'Reducing the mesh… a large mesh takes a few seconds.' : ''}
          </p>
        </>
      )}
      <FormAlert kind="error" message={error} />
    </section>
  );
}
