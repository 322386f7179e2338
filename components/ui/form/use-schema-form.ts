import {
  type DefaultValues,
  type FieldValues,
  type Mode,
  type Path,
  useForm,
} from 'react-hook-form';

import { ApiError, errorMessage } from '@/hooks/api-errors';

import { type FormBinding } from './binding';

/**
 * react-hook-form over a binding: the shared schema checks the values, and `submit` puts the
 * server's field errors on the fields they name, anything else in one message for the form.
 */
export function useSchemaForm<Values extends FieldValues, Body>(
  binding: FormBinding<Values, Body>,
  defaultValues: Values,
  /** `onChange` says what is wrong with a field as it is typed, not first on submit. */
  mode: Mode = 'onSubmit',
) {
  const form = useForm<Values, unknown, Body>({
    resolver: binding.resolver,
    defaultValues: defaultValues as DefaultValues<Values>,
    mode,
  });

  const submit = (send: (body: Body) => Promise<void>) =>
    form.handleSubmit(async (body) => {
      try {
        await send(body);
      } catch (error) {
        const fieldErrors = error instanceof ApiError ? error.fieldErrors : {};
        let placed = 0;
        for (const [path, message] of Object.entries(fieldErrors)) {
          const field = binding.fieldFor(path);
          if (field === undefined) continue;
          form.setError(field as Path<Values>, { type: 'server', message });
          placed += 1;
        }
        if (placed === 0) form.setError('root.server', { message: errorMessage(error) });
      }
    });

  return { ...form, submit };
}

export type SchemaForm<Values extends FieldValues, Body> = ReturnType<
  typeof useSchemaForm<Values, Body>
>;
