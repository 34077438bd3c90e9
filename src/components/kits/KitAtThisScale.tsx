import type { KitPreview } from './kit-queries';
import type { KitStageDone } from '../../lib/kit/kit-stages';
import BuildStatus from './BuildStatus';

interface Props {
  preview: KitPreview | undefined;
  building: boolean;
  error: string | null;
  stagesDone: KitStageDone[];
  cancelled: boolean;
  onCancel: () => void;
  onRebuild: () => void;
}

/** The builder's summary of the kit at the chosen scale (sizes, sheets, teams) and the build's status. */
export default function KitAtThisScale({ preview: data, building, error, ...status }: Props) {
  return (
    <section aria-labelledby="kit-summary-h" className="card">
      <h2 id="kit-summary-h" className="text-lg font-bold">
        At this scale
      </h2>
      {data ? (
        <ul className="mt-2 list-disc pl-5" data-testid="kit-summary" data-scale={data.scaleDenominator}>
          {data.summary.clauses.map((c) => (
            <li key={c}>{c[0]!.toUpperCase() + c.slice(1)}.</li>
          ))}
          <li>
            {data.sheetCount} {data.sheetCount === 1 ? 'sheet' : 'sheets'} of {data.sheetSizeLabel}
            {data.copies > 1 ? ` for ${data.copies} teams` : ''}.
          </li>
        </ul>
      ) : (
        <p className="mt-2 text-ink-soft">
          {building ? 'Building the first preview…' : 'Choose settings to see the kit.'}
        </p>
      )}
      <div className="mt-3">
        <BuildStatus
          building={building}
          error={error}
          done={status.stagesDone}
          timings={data?.timingsMs ?? null}
          cancelled={status.cancelled}
          onCancel={status.onCancel}
          onRebuild={status.onRebuild}
        />
      </div>
    </section>
  );
}
