/**
 * Server adapter: the first data of the kit builder page (models, classes, limits, the solver's suggestion
 * and the first sheets), read straight from src/lib so the island draws its first frame without a request.
 */
import type { Actor } from '../auth/actor';
import { classListForTeacher } from '../db/classes';
import { USUAL_SCALE_DENOMINATORS } from '../layout/scale-ratios';
import { PRINT_BEDS, PRINT_CHOICE_DEFAULT } from '../layout/print-plate';
import { SHEET_SIZES } from '../layout/sheet-sizes';
import { VENUES } from '../layout/venues';
import { AppError } from '../errors';
import { BUILD_GRADE_BAND_DEFAULT } from '../geometry/buildability';
import { demoModelById, demoModels } from './demo-models.server';
import { PAPER_GSM_DEFAULT } from '../geometry/paper';
import { KIT_SETTINGS_LIMITS, type KitInputs } from './kit-inputs';
import { kitPreview, kitScaleSolve } from './kit-preview.server';
import { INSTRUCTIONS_PLACE_DEFAULT, type KitForm } from './kit-settings';
import type { KitBuilderProps } from './kit-builder-props';
import { importedModelList } from '../models/imported-models.server';
import { modelSourceInline } from '../models/model-source.server';
import type { ImportedModelView } from '../models/imported-model-inputs';
import { meshSizeLabel } from '../ui/mesh-size-label';

/** An imported model as the builder's model list shows it: faces, real size and, when shared, who shared it. */
function importChoice(m: ImportedModelView): KitBuilderProps['imports'][number] {
  const shared = m.shared && !m.canChange && m.ownerName ? ` · shared by ${m.ownerName}` : '';
  return {
    id: m.id,
    title: m.title,
    summary: `Imported from ${m.fileName}: ${m.faceCount.toLocaleString('en-US')} faces, ${meshSizeLabel(m.sizeByUnitM[m.unit])}${shared}.`,
  };
}

/**
 * Props for the KitBuilder island from the query (?model= a demo model or ?import= an imported one, &activity=)
 * and the actor's classes and imported models.
 */
export async function kitBuilderProps(
  actor: Actor,
  query: URLSearchParams,
  activities: KitBuilderProps['activities'],
): Promise<KitBuilderProps> {
  const models = demoModels();
  const model = demoModelById(query.get('model') ?? '') ?? demoModelById('skein-probe') ?? models[0]!;
  const imports = actor.kind === 'user' ? await importedModelList(actor) : [];
  const chosenImport = imports.find((m) => m.id === query.get('import'));
  const activity = activities.find((a) => a.slug === query.get('activity'));
  const sheetSizeId = query.get('sheet') === 'a4' ? 'a4' : 'letter';
  const classes =
    actor.kind === 'user' && actor.role === 'teacher'
      ? (await classListForTeacher(actor.userId)).map((c) => ({ id: c.id, name: c.name, gradeBand: c.grade_band }))
      : [];
  // The grade band starts from the class the kit is for (?class=, else the teacher's first class).
  const gradeClass = classes.find((c) => c.id === query.get('class')) ?? classes[0];
  const base = {
    ...(chosenImport ? { importId: chosenImport.id } : { modelId: model.id }),
    sheetSizeId,
    paperGsm: PAPER_GSM_DEFAULT,
    units: 'metric',
    venue: { kind: 'preset', id: 'classroom' },
    gradeBand: gradeClass?.gradeBand ?? BUILD_GRADE_BAND_DEFAULT,
  } as const;
  let initialError: string | null = null;
  // The engine's calls take an imported model inline, as the API routes hand it over (modelSourceInline).
  const solve = await kitScaleSolve(await modelSourceInline(actor, { ...base, ratios: 'usual' as const })).catch(
    (err: unknown) => {
      if (!(err instanceof AppError)) throw err;
      initialError = err.message;
      return null;
    },
  );
  const initial = {
    ...base,
    venue: { ...base.venue },
    scaleDenominator: solve?.suggestedScaleDenominator ?? 20,
    copies: 1,
    print: PRINT_CHOICE_DEFAULT,
    instructionsAt: INSTRUCTIONS_PLACE_DEFAULT,
    ...(activity ? { activitySlug: activity.slug } : {}),
  } satisfies KitForm & KitInputs;
  const preview = await kitPreview(await modelSourceInline(actor, initial)).catch((err: unknown) => {
    if (!(err instanceof AppError)) throw err;
    initialError = err.message;
    return null;
  });
  return {
    models: models.map(({ id, title, summary }) => ({ id, title, summary })),
    imports: imports.map(importChoice),
    activities,
    classes,
    sheetSizes: Object.values(SHEET_SIZES).map(({ id, label }) => ({ id, label })),
    venues: Object.values(VENUES).map(({ id, label }) => ({ id, label })),
    printBeds: Object.entries(PRINT_BEDS).map(([id, { label }]) => ({ id, label })),
    usualScales: [...USUAL_SCALE_DENOMINATORS],
    limits: KIT_SETTINGS_LIMITS,
    initial,
    initialPreview: preview,
    initialSolve: solve,
    initialError,
    gradeClassId: gradeClass ? gradeClass.id : null,
  };
}
