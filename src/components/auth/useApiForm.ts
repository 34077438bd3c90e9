/**
 * react-hook-form wired to a shared zod schema and one API route: the same schema checks the input in the
 * browser and on the server; server field errors land next to their fields, a whole-form error in the
 * alert, and typed input is kept after a failed submit.
 */
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, type DefaultValues, type FieldValues, type Path } from 'react-hook-form';
import type { ZodType, ZodTypeDef } from 'zod';
import { apiSettle, type ApiInit } from '../../lib/http/client';

interface Options<In extends FieldValues, Out, Res> {
  schema: ZodType<Out, ZodTypeDef, In>;
  method?: ApiInit['method'];
  path: string;
  defaultValues?: DefaultValues<In>;
  /** Extra fields sent with the form's values (a token from the link). */
  extra?: Record<string, unknown>;
  onSuccess?: (data: Res, values: Out) => void;
}

export function useApiForm<In extends FieldValues, Out, Res = { message?: string }>(o: Options<In, Out, Res>) {
  const form = useForm<In, unknown, Out>({
    resolver: zodResolver(o.schema),
    defaultValues: o.defaultValues,
    mode: 'onTouched',
    shouldFocusError: true,
  });
  const [formError, setFormError] = useState<string | null>(null);
  const [success, setSuccess] = useState<string | null>(null);

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    setSuccess(null);
    const result = await apiSettle<Res>(o.path, {
      method: o.method ?? 'POST',
      body: { ...(values as object), ...o.extra },
    });
    if (result.ok) {
      const message = (result.data as { message?: string } | null)?.message;
      if (message) setSuccess(message);
      o.onSuccess?.(result.data, values);
      return;
    }
    const { fields, status, message } = result.error;
    const fieldNames = Object.keys(fields).filter((name) => name !== '' && name in (form.getValues() as object));
    for (const name of fieldNames) {
      form.setError(name as Path<In>, { type: 'server', message: fields[name]![0] }, { shouldFocus: true });
    }
    if (fieldNames.length === 0 || status === 429) setFormError(message);
  });

  return { form, onSubmit, formError, success };
}
