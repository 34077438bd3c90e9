/**
 * Server adapter: the demo models of content/models, parsed once with ModelContentSchema (the files are
 * bundled by Vite's import.meta.glob, so the built server needs no content folder at run time).
 */
import { ModelContentSchema, type Model, type ModelContent } from '../geometry/model-schema';
import { InputError } from '../errors';

const files = import.meta.glob<{ default: unknown }>('../../../content/models/*.json', { eager: true });

let parsed: ModelContent[] | undefined;

/** Every demo model, by title. */
export function demoModels(): ModelContent[] {
  parsed ??= Object.values(files)
    .map((f) => ModelContentSchema.parse(f.default))
    .sort((a, b) => a.title.localeCompare(b.title));
  return parsed;
}

/** The demo model with this id, or null. */
export function demoModelById(id: string): ModelContent | null {
  return demoModels().find((m) => m.id === id) ?? null;
}

/** The model of a model source: the demo model named by modelId (400 when unknown) or the model sent. */
export function demoModelResolve(source: { modelId?: string; model?: Model }): {
  id: string;
  title: string;
  model: Model;
} {
  if (source.model) return { id: 'custom', title: source.model.name, model: source.model };
  const found = demoModelById(source.modelId ?? '');
  if (!found) {
    throw new InputError(
      `There is no demo model "${source.modelId}". Use one of: ${demoModels()
        .map((m) => m.id)
        .join(', ')}.`,
      { modelId: ['not a demo model'] },
    );
  }
  return { id: found.id, title: found.title, model: found.model };
}
