import { useEffect, useMemo, useRef, useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { keepPreviousData, QueryClient, QueryClientProvider, useQuery, useQueryClient } from '@tanstack/react-query';
import { ApiError } from '../../lib/http/client';
import { kitFormSchema, type KitForm } from '../../lib/kit/kit-settings';
import {
  kitPreviewQueryOptions,
  scaleSolveQueryOptions,
  type BuildListener,
  type KitView,
} from '../../lib/kit/kit-queries';
import type { KitStageDone } from '../../lib/kit/kit-stages';
import type { KitBuilderProps } from './builder-props';
import BuildStatus from './BuildStatus';
import DownloadButtons from './DownloadButtons';
import PrintPlateSummary from './PrintPlateSummary';
import PrintTargetFields from './PrintTargetFields';
import SaveKitPanel from './SaveKitPanel';
import ScaleAdvice from './ScaleAdvice';
import ScaleField from './ScaleField';
import SheetPreviews from './SheetPreviews';

/** Typing in a number field waits this long before building (a click on a scale button builds at once). */
const TYPING_DEBOUNCE_MS = 250;

const errorText = (err: unknown) => (err instanceof ApiError ? err.message : err ? 'Something went wrong.' : null);

/** The kit builder island: settings on the left, the solver's advice, live sheets and saving on the right. */
export default function KitBuilder(props: KitBuilderProps) {
  const [client] = useState(() => {
    const c = new QueryClient({
      defaultOptions: {
        queries: {
          refetchOnWindowFocus: false,
          retry: (count, err) => !(err instanceof ApiError && err.status > 0 && err.status < 500) && count < 2,
        },
      },
    });
    if (props.initialPreview) c.setQueryData(kitPreviewQueryOptions(props.initial).queryKey, props.initialPreview);
    if (props.initialSolve) {
      const { modelId, sheetSizeId, paperGsm, units, venue, gradeBand } = props.initial;
      c.setQueryData(
        scaleSolveQueryOptions({ modelId, sheetSizeId, paperGsm, units, venue, gradeBand }).queryKey,
        props.initialSolve,
      );
    }
    return c;
  });
  return (
    <QueryClientProvider client={client}>
      <KitBuilderForm {...props} />
    </QueryClientProvider>
  );
}

function KitBuilderForm(props: KitBuilderProps) {
  const { models, activities, classes, sheetSizes, venues, printBeds, usualScales, limits, initial } = props;
  const schema = useMemo(() => kitFormSchema(limits), [limits]);
  const { register, watch, setValue, formState } = useForm<KitForm>({
    resolver: zodResolver(schema),
    defaultValues: initial,
    mode: 'onChange',
  });
  const client = useQueryClient();
  const values = watch();
  const parsed = schema.safeParse(values);
  const valid = parsed.success ? parsed.data : null;
  const validKey = valid ? JSON.stringify(valid) : null;

  // The settings the preview is built from: immediately after a click, after a pause while typing.
  const [settled, setSettled] = useState<KitForm>(initial);
  const immediate = useRef(false);
  useEffect(() => {
    if (!valid) return;
    const delay = immediate.current ? 0 : TYPING_DEBOUNCE_MS;
    immediate.current = false;
    const timer = setTimeout(() => setSettled(valid), delay);
    return () => clearTimeout(timer);
    // validKey stands for valid's content, so an equal form does not restart the timer.
  }, [validKey]);

  const [stagesDone, setStagesDone] = useState<KitStageDone[]>([]);
  const [cancelled, setCancelled] = useState(false);
  const listener = useMemo<BuildListener>(
    () => ({
      begin: () => {
        setStagesDone([]);
        setCancelled(false);
      },
      stage: (stage, ms) => setStagesDone((d) => [...d, { stage, ms }]),
    }),
    [],
  );
  const preview = useQuery({ ...kitPreviewQueryOptions(settled, listener), placeholderData: keepPreviousData });
  const solveParams = {
    modelId: settled.modelId,
    sheetSizeId: settled.sheetSizeId,
    paperGsm: settled.paperGsm,
    units: settled.units,
    venue: settled.venue,
    gradeBand: settled.gradeBand,
  };
  const solve = useQuery({ ...scaleSolveQueryOptions(solveParams), placeholderData: keepPreviousData });
  const [saved, setSaved] = useState<KitView | null>(null);
  useEffect(() => setSaved(null), [validKey]);

  const change = <K extends keyof KitForm>(name: K, value: KitForm[K], now = true) => {
    immediate.current = now;
    // react-hook-form's path typing cannot follow a generic key into the discriminated venue union.
    setValue(name, value as never, { shouldValidate: true, shouldDirty: true });
  };
  const model = models.find((m) => m.id === values.modelId);
  const activityList = activities.filter(
    (a) => !values.modelId || a.models.includes(values.modelId) || a.slug === values.activitySlug,
  );
  const venueKey = values.venue?.kind === 'preset' ? values.venue.id : 'custom';
  const err = formState.errors;
  const data = preview.data;
  const building = preview.isFetching;
  const showError = !building && preview.isError ? errorText(preview.error) : null;

  return (
    <div className="grid gap-8 lg:grid-cols-[22rem_1fr]">
      <form
        className="card flex flex-col gap-5 self-start"
        onSubmit={(e) => e.preventDefault()}
        aria-label="Kit settings"
        noValidate
      >
        <div>
          <label className="field-label" htmlFor="kit-activity">
            Activity
          </label>
          <select
            id="kit-activity"
            className="field-input"
            {...register('activitySlug', { setValueAs: (v) => v || undefined })}
          >
            <option value="">No activity</option>
            {activityList.map((a) => (
              <option key={a.slug} value={a.slug}>
                {a.title}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label className="field-label" htmlFor="kit-model">
            Model
          </label>
          <select
            id="kit-model"
            className="field-input"
            {...register('modelId', { onChange: () => (immediate.current = true) })}
          >
            {models.map((m) => (
              <option key={m.id} value={m.id}>
                {m.title}
              </option>
            ))}
          </select>
          {model && <p className="mt-1 text-sm text-ink-soft">{model.summary}</p>}
        </div>
        <ScaleField
          value={values.scaleDenominator}
          usualScales={usualScales}
          suggested={solve.data?.suggestedScaleDenominator ?? null}
          max={limits.scaleDenominatorMax}
          error={err.scaleDenominator?.message}
          onChange={(n, now) => change('scaleDenominator', n, now)}
          onCommit={() => valid && setSettled(valid)}
        />
        <div className="grid grid-cols-2 gap-3">
          <div>
            <label className="field-label" htmlFor="kit-sheet">
              Sheet size
            </label>
            <select
              id="kit-sheet"
              className="field-input"
              {...register('sheetSizeId', { onChange: () => (immediate.current = true) })}
            >
              {sheetSizes.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.label}
                </option>
              ))}
            </select>
          </div>
          <div>
            <label className="field-label" htmlFor="kit-gsm">
              Paper, g/m²
            </label>
            <input
              id="kit-gsm"
              type="number"
              min={limits.paperGsmMin}
              max={limits.paperGsmMax}
              className="field-input"
              aria-invalid={err.paperGsm ? true : undefined}
              aria-describedby={err.paperGsm ? 'kit-gsm-err' : undefined}
              {...register('paperGsm', { valueAsNumber: true })}
            />
            {err.paperGsm && (
              <p id="kit-gsm-err" className="field-error">
                {err.paperGsm.message}
              </p>
            )}
          </div>
        </div>
        <div>
          <label className="field-label" htmlFor="kit-grade">
            Who builds it
          </label>
          <select
            id="kit-grade"
            className="field-input"
            aria-describedby="kit-grade-hint"
            {...register('gradeBand', { onChange: () => (immediate.current = true) })}
          >
            {limits.gradeBands.map((g) => (
              <option key={g} value={g}>
                {limits.gradeBandWords[g]}
              </option>
            ))}
          </select>
          <p id="kit-grade-hint" className="mt-1 text-sm text-ink-soft">
            {props.gradeBandFrom && values.gradeBand === initial.gradeBand
              ? `From your class ${props.gradeBandFrom}. `
              : ''}
            The scale keeps every piece, tab and fold big enough for them.
          </p>
        </div>
        <div>
          <label className="field-label" htmlFor="kit-venue">
            Venue for the booms
          </label>
          <select
            id="kit-venue"
            className="field-input"
            value={venueKey}
            onChange={(e) =>
              change(
                'venue',
                e.target.value === 'custom'
                  ? { kind: 'custom', lengthM: 30, widthM: 20 }
                  : { kind: 'preset', id: e.target.value },
              )
            }
          >
            {venues.map((v) => (
              <option key={v.id} value={v.id}>
                {v.label[0]!.toUpperCase() + v.label.slice(1)}
              </option>
            ))}
            <option value="custom">Custom length × width</option>
          </select>
          {venueKey === 'custom' && (
            <div className="mt-2 grid grid-cols-2 gap-3">
              <div>
                <label className="field-label" htmlFor="kit-venue-l">
                  Length, m
                </label>
                <input
                  id="kit-venue-l"
                  type="number"
                  step="any"
                  min={0}
                  className="field-input"
                  {...register('venue.lengthM', { valueAsNumber: true })}
                />
              </div>
              <div>
                <label className="field-label" htmlFor="kit-venue-w">
                  Width, m
                </label>
                <input
                  id="kit-venue-w"
                  type="number"
                  step="any"
                  min={0}
                  className="field-input"
                  {...register('venue.widthM', { valueAsNumber: true })}
                />
              </div>
              {(err.venue as { lengthM?: { message?: string }; widthM?: { message?: string } } | undefined)
                ?.lengthM && (
                <p className="field-error col-span-2">
                  {(err.venue as { lengthM?: { message?: string } }).lengthM?.message}
                </p>
              )}
            </div>
          )}
        </div>
        <PrintTargetFields
          value={values.print ?? initial.print!}
          beds={printBeds}
          nozzlesMm={limits.printNozzlesMm}
          bedMinMm={limits.printBedMinMm}
          bedMaxMm={limits.printBedMaxMm}
          errors={parsed.success ? {} : printErrors(parsed.error.issues)}
          onChange={(next, now) => change('print', next, now)}
        />
        <div className="grid grid-cols-2 gap-3">
          <div>
            <label className="field-label" htmlFor="kit-copies">
              Copies (one per team)
            </label>
            <input
              id="kit-copies"
              type="number"
              min={1}
              max={limits.copiesMax}
              className="field-input"
              aria-invalid={err.copies ? true : undefined}
              aria-describedby={err.copies ? 'kit-copies-err' : undefined}
              {...register('copies', { valueAsNumber: true })}
            />
            {err.copies && (
              <p id="kit-copies-err" className="field-error">
                {err.copies.message}
              </p>
            )}
          </div>
          <div>
            <label className="field-label" htmlFor="kit-units">
              Units
            </label>
            <select
              id="kit-units"
              className="field-input"
              {...register('units', { onChange: () => (immediate.current = true) })}
            >
              <option value="metric">Metric (mm, m)</option>
              <option value="us">US (in, ft)</option>
            </select>
          </div>
        </div>
        <div>
          <label className="field-label" htmlFor="kit-instructions">
            Instructions pages in the PDF
          </label>
          <select
            id="kit-instructions"
            className="field-input"
            {...register('instructionsAt', { onChange: () => (immediate.current = true) })}
          >
            <option value="last">After the sheets</option>
            <option value="first">Before the sheets</option>
          </select>
        </div>
        <div>
          <label className="field-label" htmlFor="kit-title">
            Title on the sheets (optional)
          </label>
          <input
            id="kit-title"
            className="field-input"
            maxLength={80}
            placeholder={model?.title}
            {...register('title', { setValueAs: (v: string) => (v?.trim() ? v.trim() : undefined) })}
          />
          {err.title && <p className="field-error">{err.title.message}</p>}
        </div>
      </form>

      <div className="flex min-w-0 flex-col gap-5">
        <ScaleAdvice
          solution={solve.data}
          loading={solve.isFetching}
          error={solve.isError ? errorText(solve.error) : null}
          currentScale={values.scaleDenominator}
          onUse={(n) => change('scaleDenominator', n)}
        />
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
              error={showError ?? props.initialError}
              done={stagesDone}
              timings={data?.timingsMs ?? null}
              cancelled={cancelled}
              onCancel={() => {
                setCancelled(true);
                void client.cancelQueries({ queryKey: ['kit-preview'] });
              }}
              onRebuild={() => void preview.refetch()}
            />
          </div>
        </section>
        {data && (
          <section aria-labelledby="kit-print-h" className="card">
            <h2 id="kit-print-h" className="text-lg font-bold">
              3D print
            </h2>
            <div className="mt-2">
              <PrintPlateSummary print={data.print} />
            </div>
          </section>
        )}
        <section aria-labelledby="kit-save-h" className="card flex flex-col gap-4">
          <h2 id="kit-save-h" className="text-lg font-bold">
            Save and download
          </h2>
          <SaveKitPanel
            classes={classes}
            form={valid}
            modelTitle={model?.title ?? ''}
            sheetCount={data?.sheetCount ?? 0}
            onSaved={setSaved}
          />
          <DownloadButtons form={valid} saved={saved} sheetCount={data?.sheetCount ?? 0} />
        </section>
        <section aria-labelledby="kit-sheets-h">
          <h2 id="kit-sheets-h" className="mb-3 text-lg font-bold">
            Sheets
          </h2>
          {data && data.sheets.length > 0 ? (
            <SheetPreviews sheets={data.sheets} title={data.title} stale={building} />
          ) : (
            <p className="text-ink-soft">{building ? 'Building…' : 'No sheets yet.'}</p>
          )}
        </section>
      </div>
    </div>
  );
}

/** The messages of the print fields' errors, by field, from the form's own parse (the fields are not registered). */
function printErrors(
  issues: readonly { path: (string | number)[]; message: string }[],
): Partial<Record<'widthMm' | 'depthMm' | 'heightMm' | 'nozzleMm', string>> {
  const out: Partial<Record<'widthMm' | 'depthMm' | 'heightMm' | 'nozzleMm', string>> = {};
  for (const issue of issues) {
    if (issue.path[0] !== 'print') continue;
    const key = issue.path[issue.path.length - 1];
    if (key === 'widthMm' || key === 'depthMm' || key === 'heightMm' || key === 'nozzleMm') out[key] ??= issue.message;
  }
  return out;
}
