import { useState } from 'react';
import type { ImportedModelView } from '../../lib/models/imported-model-inputs';
import MeshKitSummaryPanel from './MeshKitSummaryPanel';
import ModelDeleteButton from './ModelDeleteButton';
import ModelReduction from './ModelReduction';
import ModelShareToggle from './ModelShareToggle';
import ModelUnitChoice from './ModelUnitChoice';

interface Props {
  model: ImportedModelView;
  sheetSizes: { id: string; label: string }[];
  paperGsmDefault: number;
  /** Coordinators and admins: the share toggle. */
  canShare: boolean;
}

/**
 * The changing part of an imported model's page: the unit question, the reduction, the kit summary, sharing and
 * deleting. One model state, so a change made in one section (the unit) shows in the others (sizes, summary).
 */
export default function ImportedModelPanel(props: Props) {
  const [model, setModel] = useState(props.model);
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <div className="flex flex-col gap-6">
        <ModelUnitChoice model={model} onChanged={setModel} />
        <ModelReduction model={model} onChanged={setModel} />
      </div>
      <div className="flex flex-col gap-6">
        <MeshKitSummaryPanel model={model} sheetSizes={props.sheetSizes} paperGsmDefault={props.paperGsmDefault} />
        {(props.canShare || model.canChange) && (
          <section className="card flex flex-col gap-4" aria-labelledby="manage-h">
            <h2 id="manage-h" className="text-lg font-bold">
              {props.canShare ? 'Sharing and deleting' : 'Delete'}
            </h2>
            {props.canShare && <ModelShareToggle model={model} onChanged={setModel} />}
            {model.canChange && <ModelDeleteButton model={model} />}
          </section>
        )}
      </div>
    </div>
  );
}
