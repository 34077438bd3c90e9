import { useState } from 'react';
import { apiSettle } from '../../lib/http/client';
import type { ImportedModelChange, ImportedModelView } from '../../lib/models/imported-model-inputs';

/**
 * One kind of change to an imported model (unit, reduction, sharing): sends the PATCH, hands the answered model
 * to `onChanged`, and keeps its own busy flag and error, so each control shows its message beside itself.
 */
export function useModelChange(modelId: string, onChanged: (model: ImportedModelView) => void) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function change(body: ImportedModelChange): Promise<boolean> {
    setBusy(true);
    setError(null);
    const result = await apiSettle<{ model: ImportedModelView }>(`/api/models/imports/${modelId}`, {
      method: 'PATCH',
      body,
    });
    setBusy(false);
    if (!result.ok) {
      setError(result.error.message);
      return false;
    }
    onChanged(result.data.model);
    return true;
  }
  return { change, busy, error };
}

/** Why unit and reduction stay fixed: saved kits are built from the model as it is (the API answers 409 too). */
export function kitsLockedSentence(kitCount: number): string {
  return `${kitCount === 1 ? '1 saved kit is' : `${kitCount} saved kits are`} built from this model, so it stays as it is; import the file again to change it.`;
}
