import { useEffect, useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { keepPreviousData, useQuery, useQueryClient } from '@tanstack/react-query';
import { ApiError } from '../../lib/http/client';
import { kitFormSchema, type KitForm } from '../../lib/kit/kit-settings';
import { kitPreviewQueryOptions, kitSheetsQueryOptions, scaleSolveQueryOptions, type KitView } from './kit-queries';
import type { KitBuilderProps } from '../../lib/kit/kit-builder-props';
import DownloadButtons from './DownloadButtons';
import KitAtThisScale from './KitAtThisScale';
import KitSettingsFields from './KitSettingsFields';
import PrintPlateSummary from './PrintPlateSummary';
import SaveKitPanel from './SaveKitPanel';
import ScaleAdvice from './ScaleAdvice';
import SheetPreviews from './SheetPreviews';
import { useBuildStages } from './useBuildStages';
import { useSettledSettings } from './useSettledSettings';
import { builderModelOf, modelFieldsOf } from './builder-models';

/** Stands in for the saved kit while there is none (its sheets query is disabled then). */
const PENDING_KIT = { id: '', contentHash: '', links: { svgSheets: [] as string[] } } as const;

const errorText = (err: unknown) => (err instanceof ApiError ? err.message : err ? 'Something went wrong.' : null);

/** The builder's form on the left; the solver's advice, the kit at this scale, saving and the sheets on the right. */
export default function KitBuilderForm(props: KitBuilderProps) {
  const { classes, limits, initial } = props;
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
  const { settled, validKey, nextChangeNow, settleNow } = useSettledSettings(initial, valid);
  const stages = useBuildStages();
  const preview = useQuery({ ...kitPreviewQueryOptions(settled, stages.listener), placeholderData: keepPreviousData });
  const data = preview.data;
  const building = preview.isFetching;
  const solveParams = {
    modelId: settled.modelId,
    importId: settled.importId,
    sheetSizeId: settled.sheetSizeId,
    paperGsm: settled.paperGsm,
    units: settled.units,
    venue: settled.venue,
    gradeBand: settled.gradeBand,
  };
  const solve = useQuery({ ...scaleSolveQueryOptions(solveParams), placeholderData: keepPreviousData });
  const [saved, setSaved] = useState<KitView | null>(null);
  useEffect(() => setSaved(null), [validKey]);
  // After saving, the sheets shown are the saved kit's own: its first sheet carries the kit's QR code.
  const savedSheets = useQuery({ ...kitSheetsQueryOptions(saved ?? PENDING_KIT), enabled: saved !== null });
  const [classId, setClassId] = useState(props.gradeClassId ?? classes[0]?.id ?? '');
  const gradeClass = classes.find((c) => c.id === classId);

  const change = <K extends keyof KitForm>(name: K, value: KitForm[K], now = true) => {
    nextChangeNow(now);
    // react-hook-form's path typing cannot follow a generic key into the discriminated venue union.
    setValue(name, value as never, { shouldValidate: true, shouldDirty: true });
  };
  const chooseClass = (id: string) => {
    setClassId(id);
    const band = classes.find((c) => c.id === id)?.gradeBand;
    if (band && limits.gradeBands.includes(band)) change('gradeBand', band);
  };
  // Both model fields change together (one is cleared), so the form is never read with two models or none.
  const chooseModel = (choice: string) => {
    const fields = modelFieldsOf(choice);
    nextChangeNow(true);
    setValue('modelId', fields.modelId, { shouldDirty: true });
    setValue('importId', fields.importId, { shouldValidate: true, shouldDirty: true });
  };
  const model = builderModelOf(props, values);
  const sheets = saved && savedSheets.data ? savedSheets.data : (data?.sheets ?? []);

  return (
    <div className="grid gap-8 lg:grid-cols-[22rem_1fr]">
      <form
        className="card flex flex-col gap-5 self-start"
        onSubmit={(e) => e.preventDefault()}
        aria-label="Kit settings"
        noValidate
      >
        <KitSettingsFields
          {...props}
          values={values}
          errors={formState.errors}
          issues={parsed.success ? [] : parsed.error.issues}
          register={register}
          change={change}
          chooseModel={chooseModel}
          settleNow={settleNow}
          suggestedScale={solve.data?.suggestedScaleDenominator ?? null}
          gradeBandFrom={gradeClass && values.gradeBand === gradeClass.gradeBand ? gradeClass.name : null}
        />
      </form>

      <div className="flex min-w-0 flex-col gap-5">
        <ScaleAdvice
          solution={solve.data}
          loading={solve.isFetching}
          error={solve.isError ? errorText(solve.error) : null}
          currentScale={values.scaleDenominator}
          onUse={(n) => change('scaleDenominator', n)}
        />
        <KitAtThisScale
          preview={data}
          building={building}
          error={(!building && preview.isError ? errorText(preview.error) : null) ?? props.initialError}
          stagesDone={stages.stagesDone}
          cancelled={stages.cancelled}
          onCancel={() => {
            stages.markCancelled();
            void client.cancelQueries({ queryKey: ['kit-preview'] });
          }}
          onRebuild={() => void preview.refetch()}
        />
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
            classId={classId}
            onClassChange={chooseClass}
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
          {data && sheets.length > 0 ? (
            <SheetPreviews
              sheets={sheets}
              title={data.title}
              stale={building || (saved !== null && savedSheets.isFetching)}
              qr={saved && savedSheets.data ? 'saved' : 'note'}
              notes={data.notes}
            />
          ) : (
            <p className="text-ink-soft">{building ? 'Building…' : 'No sheets yet.'}</p>
          )}
        </section>
      </div>
    </div>
  );
}
