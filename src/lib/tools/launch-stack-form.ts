/**
 * The launch-stack tool's form: every field a text keyed by its request path ("fairing.diameterM"), sizes in
 * m or cm and masses in kg or g as the class chooses (the paper model is measured in cm and g), turned into a
 * LaunchStackInput in metres and kilograms.
 */
import type { LaunchStackInput } from '../analysis/launch-stack';
import { LAUNCH_STACK_SAMPLE } from './launch-stack-sample';
import { formFieldNumber, type CellErrors, type TableRequest } from './table-cells';

export type LaunchStackLengthUnit = 'm' | 'cm';
export type LaunchStackMassUnit = 'kg' | 'g';
export const LAUNCH_STACK_LENGTH_PER_M: Record<LaunchStackLengthUnit, number> = { m: 1, cm: 100 };
export const LAUNCH_STACK_MASS_PER_KG: Record<LaunchStackMassUnit, number> = { kg: 1, g: 1000 };
/** Wall facets of a round probe body typed in the form (corners on the circle, so the width is exact). */
export const LAUNCH_STACK_FORM_FACETS = 64;

export type LaunchStackBodyKind = 'prism' | 'box' | 'cylinder';

export interface LaunchStackForm {
  lengthUnit: LaunchStackLengthUnit;
  massUnit: LaunchStackMassUnit;
  bodyKind: LaunchStackBodyKind;
  across: 'flats' | 'corners';
  /** Number fields as typed, keyed by request path. */
  values: Record<string, string>;
}

/** Length fields per body kind (request paths), then the fields every stack has. */
export const LAUNCH_STACK_BODY_FIELDS: Record<LaunchStackBodyKind, string[]> = {
  prism: ['body.sides', 'body.sizeM', 'body.heightM'],
  box: ['body.widthM', 'body.depthM', 'body.heightM'],
  cylinder: ['body.diameterM', 'body.heightM'],
};
/** The form's sections and their fields (request paths), in the order shown. */
export const LAUNCH_STACK_FORM_GROUPS: { title: string; fields: (kind: LaunchStackBodyKind) => string[] }[] = [
  { title: 'One probe', fields: (k) => [...LAUNCH_STACK_BODY_FIELDS[k], 'probeMassKg', 'probeCentreOfMassM'] },
  {
    title: 'The stack',
    fields: () => [
      'stack.count',
      'stack.ring.heightM',
      'stack.ring.diameterM',
      'ringMassKg',
      'stack.adapter.heightM',
      'stack.adapter.diameterM',
      'adapterMassKg',
    ],
  },
  {
    title: 'The fairing',
    fields: () => ['fairing.diameterM', 'fairing.cylinderHeightM', 'fairing.coneHeightM', 'fairing.clearanceM'],
  },
];
const LENGTHS = [
  'body.sizeM',
  'body.heightM',
  'body.widthM',
  'body.depthM',
  'body.diameterM',
  'probeCentreOfMassM',
  'stack.ring.heightM',
  'stack.ring.diameterM',
  'stack.adapter.heightM',
  'stack.adapter.diameterM',
  'fairing.diameterM',
  'fairing.cylinderHeightM',
  'fairing.coneHeightM',
  'fairing.clearanceM',
];
const MASSES = ['probeMassKg', 'ringMassKg', 'adapterMassKg'];
const COUNTS = ['body.sides', 'stack.count'];
const OPTIONAL = ['probeCentreOfMassM', 'fairing.clearanceM', 'ringMassKg'];

/** The sample (the Skein demo stack, real size) as a filled form. */
export function launchStackSampleForm(): LaunchStackForm {
  const s = LAUNCH_STACK_SAMPLE;
  return {
    lengthUnit: 'm',
    massUnit: 'kg',
    bodyKind: 'prism',
    across: s.body.across,
    values: {
      'body.sides': String(s.body.sides),
      'body.sizeM': String(s.body.sizeM),
      'body.heightM': String(s.body.heightM),
      'stack.count': String(s.stack.count),
      'stack.ring.heightM': String(s.stack.ring.heightM),
      'stack.ring.diameterM': String(s.stack.ring.diameterM),
      'stack.adapter.heightM': String(s.stack.adapter.heightM),
      'stack.adapter.diameterM': String(s.stack.adapter.diameterM),
      probeMassKg: String(s.probeMassKg),
      ringMassKg: String(s.ringMassKg),
      adapterMassKg: String(s.adapterMassKg),
      'fairing.diameterM': String(s.fairing.diameterM),
      'fairing.cylinderHeightM': String(s.fairing.cylinderHeightM),
      'fairing.coneHeightM': String(s.fairing.coneHeightM),
      'fairing.clearanceM': String(s.fairing.clearanceM),
    },
  };
}

/** Sets `value` at a dotted path of a plain object, making the objects on the way. */
function pathSet(target: Record<string, unknown>, path: string, value: unknown): void {
  const keys = path.split('.');
  let o = target;
  for (const k of keys.slice(0, -1)) o = (o[k] ??= {}) as Record<string, unknown>;
  o[keys.at(-1)!] = value;
}

/** The request from the form, in m and kg, or the problems keyed by field path. */
export function launchStackFormRequest(form: LaunchStackForm): TableRequest<LaunchStackInput> {
  const errors: CellErrors = {};
  const fields = LAUNCH_STACK_FORM_GROUPS.flatMap((g) => g.fields(form.bodyKind));
  const input: Record<string, unknown> = {};
  const inputOfPath: Record<string, string> = {};
  for (const path of fields) {
    inputOfPath[path] = path;
    const v = formFieldNumber(form.values[path] ?? '', path, errors, !OPTIONAL.includes(path));
    if (v === undefined) continue;
    const scale = LENGTHS.includes(path)
      ? 1 / LAUNCH_STACK_LENGTH_PER_M[form.lengthUnit]
      : MASSES.includes(path)
        ? 1 / LAUNCH_STACK_MASS_PER_KG[form.massUnit]
        : 1;
    pathSet(input, path, COUNTS.includes(path) ? v : v * scale);
  }
  pathSet(input, 'body.kind', form.bodyKind);
  if (form.bodyKind === 'prism') pathSet(input, 'body.across', form.across);
  if (form.bodyKind === 'cylinder') pathSet(input, 'body.facets', LAUNCH_STACK_FORM_FACETS);
  inputOfPath.body = 'body.heightM';
  if (Object.keys(errors).length > 0) return { input: null, errors, inputOfPath };
  return { input: input as LaunchStackInput, errors, inputOfPath };
}
