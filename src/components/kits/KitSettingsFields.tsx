import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import { KIT_TITLE_MAX_LENGTH, type KitForm } from '../../lib/kit/kit-settings';
import FieldShell from '../tools/FieldShell';
import SelectField from '../tools/SelectField';
import type { KitBuilderProps } from '../../lib/kit/kit-builder-props';
import PrintTargetFields from './PrintTargetFields';
import RegisteredNumberField from './RegisteredNumberField';
import ScaleField from './ScaleField';
import { builderModelOf, IMPORT_PREFIX, modelOptions } from './builder-models';
import VenueFields from './VenueFields';

type StaticProps = Pick<
  KitBuilderProps,
  'models' | 'imports' | 'activities' | 'sheetSizes' | 'venues' | 'printBeds' | 'usualScales' | 'limits' | 'initial'
>;

interface Props extends StaticProps {
  /** The form's current values (possibly invalid) and its field errors. */
  values: KitForm;
  errors: FieldErrors<KitForm>;
  /** The form's own parse issues (for the print fields, which are not registered). */
  issues: readonly { path: (string | number)[]; message: string }[];
  register: UseFormRegister<KitForm>;
  /** Sets a setting; `now` false while typing, so the preview waits for a pause. */
  change: <K extends keyof KitForm>(name: K, value: KitForm[K], now?: boolean) => void;
  /** Chooses the model: a demo model's id, or an imported model's as IMPORT_PREFIX + id. */
  chooseModel: (choice: string) => void;
  /** Builds the current settings now (Enter in the scale field). */
  settleNow: () => void;
  /** The solver's suggested scale, or null while it works. */
  suggestedScale: number | null;
  /** The class whose grade band the form holds, or null (said beside the band). */
  gradeBandFrom: string | null;
}

/** The kit builder's settings: activity, model, scale, paper, grade band, venue, print target, copies, title. */
export default function KitSettingsFields(props: Props) {
  const { values, errors: err, register, change, limits, initial } = props;
  const model = builderModelOf(props, values);
  const activityList = props.activities.filter(
    (a) => !values.modelId || a.models.includes(values.modelId) || a.slug === values.activitySlug,
  );
  const venueErrors = err.venue as { lengthM?: { message?: string }; widthM?: { message?: string } } | undefined;
  return (
    <>
      <SelectField
        label="Activity"
        name="activitySlug"
        value={values.activitySlug ?? ''}
        options={[{ value: '', label: 'No activity' }, ...activityList.map((a) => ({ value: a.slug, label: a.title }))]}
        onChange={(slug) => change('activitySlug', slug || undefined, false)}
      />
      <SelectField
        label="Model"
        name="modelId"
        value={values.importId ? `${IMPORT_PREFIX}${values.importId}` : (values.modelId ?? '')}
        {...modelOptions(props)}
        hint={model?.summary}
        onChange={props.chooseModel}
      />
      <ScaleField
        value={values.scaleDenominator}
        usualScales={props.usualScales}
        suggested={props.suggestedScale}
        max={limits.scaleDenominatorMax}
        error={err.scaleDenominator?.message}
        onChange={(n, now) => change('scaleDenominator', n, now)}
        onCommit={props.settleNow}
      />
      <div className="grid grid-cols-2 gap-3">
        <SelectField
          label="Sheet size"
          name="sheetSizeId"
          value={values.sheetSizeId}
          options={props.sheetSizes.map((s) => ({ value: s.id, label: s.label }))}
          onChange={(id) => change('sheetSizeId', id)}
        />
        <RegisteredNumberField
          label="Paper, g/m²"
          min={limits.paperGsmMin}
          max={limits.paperGsmMax}
          error={err.paperGsm?.message}
          registration={register('paperGsm', { valueAsNumber: true })}
        />
      </div>
      <SelectField
        label="Who builds it"
        name="gradeBand"
        value={values.gradeBand}
        options={limits.gradeBands.map((g) => ({ value: g, label: limits.gradeBandWords[g] ?? g }))}
        hint={`${
          props.gradeBandFrom ? `From your class ${props.gradeBandFrom}. ` : ''
        }The scale keeps every piece, tab and fold big enough for them.`}
        onChange={(band) => change('gradeBand', band)}
      />
      <VenueFields
        venues={props.venues}
        value={values.venue}
        register={register}
        errors={{ lengthM: venueErrors?.lengthM?.message, widthM: venueErrors?.widthM?.message }}
        onChange={(venue) => change('venue', venue)}
      />
      <PrintTargetFields
        value={values.print ?? initial.print!}
        beds={props.printBeds}
        nozzlesMm={limits.printNozzlesMm}
        bedMinMm={limits.printBedMinMm}
        bedMaxMm={limits.printBedMaxMm}
        errors={printErrors(props.issues)}
        onChange={(next, now) => change('print', next, now)}
      />
      <div className="grid grid-cols-2 gap-3">
        <RegisteredNumberField
          label="Copies (one per team)"
          min={1}
          max={limits.copiesMax}
          error={err.copies?.message}
          registration={register('copies', { valueAsNumber: true })}
        />
        <SelectField
          label="Units"
          name="units"
          value={values.units}
          options={[
            { value: 'metric', label: 'Metric (mm, m)' },
            { value: 'us', label: 'US (in, ft)' },
          ]}
          onChange={(u) => change('units', u as KitForm['units'])}
        />
      </div>
      <SelectField
        label="Instructions pages in the PDF"
        name="instructionsAt"
        value={values.instructionsAt}
        options={[
          { value: 'last', label: 'After the sheets' },
          { value: 'first', label: 'Before the sheets' },
        ]}
        onChange={(at) => change('instructionsAt', at as KitForm['instructionsAt'])}
      />
      <FieldShell label="Title on the sheets (optional)" error={err.title?.message}>
        {({ id, describedBy }) => (
          <input
            id={id}
            className="field-input"
            maxLength={KIT_TITLE_MAX_LENGTH}
            placeholder={model?.title}
            aria-invalid={err.title ? true : undefined}
            aria-describedby={describedBy}
            {...register('title', { setValueAs: (v: string) => (v?.trim() ? v.trim() : undefined) })}
          />
        )}
      </FieldShell>
    </>
  );
}

type PrintField = 'widthMm' | 'depthMm' | 'heightMm' | 'nozzleMm';

/** The messages of the print fields' errors, by field, from the form's own parse (the fields are not registered). */
function printErrors(issues: Props['issues']): Partial<Record<PrintField, string>> {
  const out: Partial<Record<PrintField, string>> = {};
  for (const issue of issues) {
    if (issue.path[0] !== 'print') continue;
    const key = issue.path[issue.path.length - 1];
    if (key === 'widthMm' || key === 'depthMm' || key === 'heightMm' || key === 'nozzleMm') out[key] ??= issue.message;
  }
  return out;
}
