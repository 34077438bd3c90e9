import { ClassCreateSchema, GRADE_BANDS, STUDENT_COUNT_MAX } from '../../lib/auth/class-schemas';
import { FormAlert } from '../auth/FormAlert';
import { FormField } from '../auth/FormField';
import { useApiForm } from '../auth/useApiForm';

/** A new class: a name, a grade band and how many students (a number only, never names). */
export default function ClassCreateForm() {
  const { form, onSubmit, formError } = useApiForm<
    { name: string; gradeBand: (typeof GRADE_BANDS)[number]; studentCount: number },
    { name: string; gradeBand: (typeof GRADE_BANDS)[number]; studentCount: number },
    { class: { id: string } }
  >({
    schema: ClassCreateSchema,
    path: '/api/classes',
    defaultValues: { name: '', gradeBand: '6-8' },
    onSuccess: (data) => window.location.assign(`/classes/${data.class.id}`),
  });
  const { errors, isSubmitting } = form.formState;
  return (
    <form method="post" noValidate onSubmit={onSubmit} className="space-y-4" aria-label="Add a class">
      <FormAlert kind="error" message={formError} />
      <FormField id="name" label="Class name" registration={form.register('name')} error={errors.name} />
      <div>
        <label htmlFor="gradeBand" className="field-label">
          Grade band
        </label>
        <select id="gradeBand" className="field-input" {...form.register('gradeBand')}>
          {GRADE_BANDS.map((band) => (
            <option key={band} value={band}>
              Grades {band}
            </option>
          ))}
        </select>
      </div>
      <FormField
        id="studentCount"
        label="Number of students"
        type="number"
        inputMode="numeric"
        min={0}
        max={STUDENT_COUNT_MAX}
        hint="A count only: Kitwright never keeps students' names."
        registration={form.register('studentCount', { valueAsNumber: true })}
        error={errors.studentCount}
      />
      <button type="submit" className="btn-primary" disabled={isSubmitting}>
        Add the class
      </button>
    </form>
  );
}
