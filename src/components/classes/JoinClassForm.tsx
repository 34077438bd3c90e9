import { ClassJoinSchema } from '../../lib/auth/class-schemas';
import { FormAlert } from '../auth/FormAlert';
import { FormField } from '../auth/FormField';
import { useApiForm } from '../auth/useApiForm';

interface Props {
  /** A same-site path to return to after joining (checked by the page with safeNextPath); null: the class page. */
  next: string | null;
  /** A class code from the link (a class poster's QR code), already checked and formatted; '' to type one. */
  code: string;
}

/** Students type the class code from their teacher; no name or e-mail is asked. */
export default function JoinClassForm({ next, code }: Props) {
  const { form, onSubmit, formError } = useApiForm({
    schema: ClassJoinSchema,
    path: '/api/classes/join',
    defaultValues: { code },
    onSuccess: () => window.location.assign(next ?? '/class'),
  });
  const { errors, isSubmitting } = form.formState;
  return (
    <form method="post" noValidate onSubmit={onSubmit} className="space-y-4" aria-label="Join a class">
      <FormAlert kind="error" message={formError} />
      <FormField
        id="code"
        label="Class code"
        hint="8 letters and digits, like JFMS-3K7Q. Capitals and the hyphen do not matter."
        autoComplete="off"
        autoCapitalize="characters"
        spellCheck={false}
        className="field-input font-mono text-xl tracking-widest uppercase"
        registration={form.register('code')}
        error={errors.code}
      />
      <button type="submit" className="btn-primary" disabled={isSubmitting}>
        Open our class
      </button>
    </form>
  );
}
