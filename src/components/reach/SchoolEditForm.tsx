/**
 * A coordinator's edit of one school's directory fields (PATCH /api/schools/ID): the API's own
 * SchoolUpdateSchema checks it in the browser, and the server's field errors land beside their fields.
 */
import { useEffect } from 'react';
import type { z } from 'zod';
import { SCHOOL_SETTINGS } from '../../lib/reach/reach-query';
import {
  GRADE_BANDS,
  SCHOOL_BASIS_MAX,
  SCHOOL_TEXT_MAX,
  SchoolUpdateSchema,
  type SchoolRecord,
  type SchoolUpdate,
} from '../../lib/reach/school-schema';
import { FormAlert } from '../auth/FormAlert';
import { numberOrNull } from '../auth/field-values';
import { FormField } from '../auth/FormField';
import { useApiForm } from '../auth/useApiForm';
import RegisteredSelect from '../events/RegisteredSelect';

interface Props {
  school: SchoolRecord;
  onSaved: (school: SchoolRecord) => void;
  onCancel: () => void;
}

const TEXT_FIELDS = [
  ['name', 'Name'],
  ['city', 'City'],
  ['district', 'District'],
  ['region', 'Region'],
  ['country', 'Country'],
] as const;

export default function SchoolEditForm({ school, onSaved, onCancel }: Props) {
  const { form, onSubmit, formError } = useApiForm<
    z.input<typeof SchoolUpdateSchema>,
    SchoolUpdate,
    { school: SchoolRecord }
  >({
    schema: SchoolUpdateSchema,
    method: 'PATCH',
    path: `/api/schools/${school.id}`,
    defaultValues: {
      name: school.name,
      city: school.city,
      district: school.district,
      region: school.region,
      country: school.country,
      setting: school.setting,
      gradeBands: school.gradeBands,
      highNeed: school.highNeed,
      highNeedBasis: school.highNeedBasis,
      highNeedYear: school.highNeedYear,
    },
    onSuccess: (data) => onSaved(data.school),
  });
  const { errors, isSubmitting } = form.formState;
  useEffect(() => form.setFocus('name'), [form]);
  const prefix = `school-${school.id}`;
  return (
    <form noValidate onSubmit={(e) => void onSubmit(e)} className="mt-3 space-y-4" aria-label={`Edit ${school.name}`}>
      <FormAlert kind="error" message={formError} />
      <div className="grid gap-4 sm:grid-cols-2">
        {TEXT_FIELDS.map(([field, label]) => (
          <FormField
            key={field}
            id={`${prefix}-${field}`}
            label={label}
            maxLength={SCHOOL_TEXT_MAX}
            registration={form.register(field)}
            error={errors[field]}
          />
        ))}
        <RegisteredSelect
          label="Setting"
          options={SCHOOL_SETTINGS.map((s) => ({ value: s, label: s }))}
          registration={form.register('setting')}
          error={errors.setting}
        />
      </div>
      <fieldset>
        <legend className="field-label">Grade bands</legend>
        <div className="mt-1 flex flex-wrap gap-4">
          {GRADE_BANDS.map((band) => (
            <label key={band} className="text-sm">
              <input type="checkbox" value={band} className="mr-1" {...form.register('gradeBands')} />
              {band}
            </label>
          ))}
        </div>
      </fieldset>
      <label className="block text-sm font-semibold">
        <input type="checkbox" className="mr-2" {...form.register('highNeed')} />
        High-need school
      </label>
      <div className="grid gap-4 sm:grid-cols-[2fr_1fr]">
        <FormField
          id={`${prefix}-basis`}
          label="High-need basis"
          hint="What the flag rests on, e.g. 62% eligible for free or reduced-price meals."
          maxLength={SCHOOL_BASIS_MAX}
          registration={form.register('highNeedBasis')}
          error={errors.highNeedBasis}
        />
        <FormField
          id={`${prefix}-year`}
          label="Year of that figure"
          hint="First year of the school year, e.g. 2025 for 2025–26."
          type="number"
          inputMode="numeric"
          registration={form.register('highNeedYear', { setValueAs: numberOrNull })}
          error={errors.highNeedYear}
        />
      </div>
      <div className="flex gap-3">
        <button type="submit" className="btn-primary" disabled={isSubmitting}>
          Save changes
        </button>
        <button type="button" className="btn-secondary" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}
