import { useEffect, useState } from 'react';
import { ApiError, api } from '../../lib/http/client';
import { scaleUsualAtLeast } from '../../lib/layout/scale-ratios';
import {
  MeshKitSummaryRequestSchema,
  type ImportedModelView,
  type MeshKitSummary,
} from '../../lib/models/imported-model-inputs';
import { meshKitSummaryWords } from '../../lib/ui/mesh-kit-summary-words';
import NumberField from '../tools/NumberField';
import SelectField from '../tools/SelectField';
import { FormAlert } from '../auth/FormAlert';

interface Props {
  model: ImportedModelView;
  sheetSizes: { id: string; label: string }[];
  paperGsmDefault: number;
}

/** A model's longest side at a scale should fit a sheet comfortably: about 20 cm. Common practice, no source. */
const COMFORTABLE_SIDE_M = 0.2;

/** The usual scale that brings the model's longest side to about COMFORTABLE_SIDE_M (1:1 for a small part). */
function scaleSuggested(model: ImportedModelView): number {
  const longestM = Math.max(...model.sizeByUnitM[model.unit]);
  return scaleUsualAtLeast(Math.max(1, longestM / COMFORTABLE_SIDE_M)) ?? 500;
}

type FieldName = 'scaleDenominator' | 'sheetSizeId' | 'paperGsm';
interface Result {
  summary: MeshKitSummary;
  scale: number;
  sheetLabel: string;
  /** The model's unit and triangle count it was worked out for: another answer is due once they change. */
  shapeKey: string;
}

const shapeKeyOf = (m: ImportedModelView) => `${m.unit}/${m.reducedTriangleCount ?? 'full'}`;

/**
 * What the model makes as a kit at a scale, sheet and paper, worked out on the server (the whole unfold, so it
 * can take seconds: the panel says it is busy meanwhile). Shown before the teacher builds and saves a kit.
 */
export default function MeshKitSummaryPanel({ model, sheetSizes, paperGsmDefault }: Props) {
  const suggested = scaleSuggested(model);
  const [scale, setScale] = useState(() => String(suggested));
  const [scaleTyped, setScaleTyped] = useState(false);
  // A new unit makes another scale suitable: follow it until the teacher types a scale of their own.
  useEffect(() => {
    if (!scaleTyped) setScale(String(suggested));
  }, [suggested]);
  const [sheetSizeId, setSheetSizeId] = useState<string>(
    MeshKitSummaryRequestSchema.shape.sheetSizeId.parse(undefined),
  );
  const [paperGsm, setPaperGsm] = useState(String(paperGsmDefault));
  const [busy, setBusy] = useState(false);
  const [errors, setErrors] = useState<Partial<Record<FieldName, string>>>({});
  const [error, setError] = useState<string | null>(null);
  const [result, setResult] = useState<Result | null>(null);
  const stale = result !== null && result.shapeKey !== shapeKeyOf(model);

  async function workOut() {
    const parsed = MeshKitSummaryRequestSchema.safeParse({
      scaleDenominator: scale.trim() === '' ? NaN : Number(scale),
      sheetSizeId,
      paperGsm: paperGsm.trim() === '' ? NaN : Number(paperGsm),
    });
    if (!parsed.success) {
      const next: Partial<Record<FieldName, string>> = {};
      for (const issue of parsed.error.issues) next[issue.path[0] as FieldName] ??= issue.message;
      return setErrors(next);
    }
    setErrors({});
    setError(null);
    setBusy(true);
    try {
      const { summary } = await api<{ summary: MeshKitSummary }>(`/api/models/imports/${model.id}/summary`, {
        body: parsed.data,
      });
      const sheetLabel = sheetSizes.find((s) => s.id === parsed.data.sheetSizeId)?.label ?? parsed.data.sheetSizeId;
      setResult({ summary, scale: parsed.data.scaleDenominator, sheetLabel, shapeKey: shapeKeyOf(model) });
    } catch (err) {
      if (!(err instanceof ApiError)) throw err;
      setError(err.message);
      setErrors(Object.fromEntries(Object.entries(err.fields).map(([k, v]) => [k, v[0]])));
    } finally {
      setBusy(false);
    }
  }

  return (
    <section className="card flex flex-col gap-4" aria-labelledby="summary-h">
      <h2 id="summary-h" className="text-lg font-bold">
        As a kit
      </h2>
      <p className="text-sm text-ink-soft">
        Choose a scale, sheet and paper to see the pieces, sheets and cutting the model makes before you build it.
      </p>
      <form
        className="flex flex-col gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          void workOut();
        }}
        noValidate
      >
        <NumberField
          label="Scale 1 :"
          name="scaleDenominator"
          value={scale}
          onChange={(v) => {
            setScale(v);
            setScaleTyped(true);
          }}
          hint={`Suggested for its size in ${model.unit}: 1:${suggested}.`}
          error={errors.scaleDenominator}
        />
        <div className="grid grid-cols-2 gap-3">
          <SelectField
            label="Sheet size"
            name="sheetSizeId"
            value={sheetSizeId}
            options={sheetSizes.map((s) => ({ value: s.id, label: s.label }))}
            onChange={setSheetSizeId}
            error={errors.sheetSizeId}
          />
          <NumberField
            label="Paper"
            unit="g/m²"
            name="paperGsm"
            value={paperGsm}
            onChange={setPaperGsm}
            error={errors.paperGsm}
          />
        </div>
        <div>
          <button type="submit" className="btn-primary" disabled={busy}>
            {busy ? 'Working it out…' : 'Work out the kit'}
          </button>
        </div>
      </form>
      <div
        aria-live="polite"
        aria-busy={busy}
        data-testid="mesh-kit-summary"
        data-state={busy ? 'busy' : result ? 'done' : 'empty'}
      >
        {busy && (
          <p className="text-ink-soft">
            Unfolding the mesh and laying out the sheets… a large mesh takes a few seconds.
          </p>
        )}
        {!busy && result && (
          <>
            {stale && (
              <p className="mb-2 text-sm font-semibold text-ink-soft">
                The unit or the triangles changed since: work the kit out again.
              </p>
            )}
            <ul className="list-disc pl-5">
              {meshKitSummaryWords(result.summary, result.scale, result.sheetLabel).map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          </>
        )}
      </div>
      <FormAlert kind="error" message={error} />
    </section>
  );
}
