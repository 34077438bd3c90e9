/**
 * The builder's model choice: demo models and the account's imported models in one select. An imported model's
 * option value carries a prefix, so one select value says which of the form's two model fields it fills.
 */
import type { KitBuilderProps } from '../../lib/kit/kit-builder-props';
import type { KitForm } from '../../lib/kit/kit-settings';

/** Marks an imported model's option value (an id of the demo models never contains a colon). */
export const IMPORT_PREFIX = 'import:';

type Choices = Pick<KitBuilderProps, 'models' | 'imports'>;
type Option = { value: string; label: string };

/** The select's options: demo models alone, or demo and imported models in a group each. */
export function modelOptions(props: Choices): { options: Option[]; groups: { label: string; options: Option[] }[] } {
  const demo = props.models.map((m) => ({ value: m.id, label: m.title }));
  if (props.imports.length === 0) return { options: demo, groups: [] };
  return {
    options: [],
    groups: [
      { label: 'Demo models', options: demo },
      {
        label: 'Imported models',
        options: props.imports.map((m) => ({ value: `${IMPORT_PREFIX}${m.id}`, label: m.title })),
      },
    ],
  };
}

/** The form's model fields for a select value: exactly one of modelId and importId. */
export function modelFieldsOf(choice: string): Pick<KitForm, 'modelId' | 'importId'> {
  return choice.startsWith(IMPORT_PREFIX)
    ? { modelId: undefined, importId: choice.slice(IMPORT_PREFIX.length) }
    : { modelId: choice, importId: undefined };
}

/** The chosen model's title and one-line summary, or undefined while none is chosen. */
export function builderModelOf(props: Choices, form: Pick<KitForm, 'modelId' | 'importId'>) {
  return form.importId
    ? props.imports.find((m) => m.id === form.importId)
    : props.models.find((m) => m.id === form.modelId);
}
