/**
 * The launch-stack calculator: N identical probes (any body of the model engine) stacked on one launch
 * adapter with a separation ring under each (the same parts as the engine's stack model,
 * src/lib/geometry/launch-stack.ts). Gives the stack's height, the height of its centre of mass, and whether
 * it fits a fairing typed as a diameter, a cylinder height and a cone above it, with what to change if not.
 *
 * Centre of mass: z_cm = Σ mᵢ·zᵢ / Σ mᵢ over the parts (the first moment of mass; any statics text, e.g.
 * Meriam & Kraige, Engineering Mechanics: Statics, ch. 5). Each ring and the adapter has its mass at
 * mid-height (a uniform part); a probe at its stated centre-of-mass height, mid-height when not given.
 * Fairing envelope: a cylinder of radius R up to H_c, then a straight cone to a point at H_c + H_k; a part fits
 * when its farthest corner stays inside the envelope, less the clearance, at the part's top (the narrowest
 * place it reaches).
 */
import { z } from 'zod';
import { InputError } from '../errors';
import { refineValid } from '../validation';
import { bodyBaseM } from '../geometry/body-shape';
import { launchStackParts, type StackPart, type StackPartRole } from '../geometry/launch-stack';
import { BodySchema, LaunchStackSchema, MODEL_LENGTH_MAX_M } from '../geometry/model-schema';

/** Largest JSON launch-stack request, bytes. */
export const LAUNCH_STACK_JSON_MAX_BYTES = 10_000;
/** Heaviest part accepted, kg (well above any single launch). */
export const LAUNCH_STACK_MASS_MAX_KG = 1_000_000;

const massKg = (what: string) =>
  z
    .number({ invalid_type_error: `${what} must be a number of kilograms` })
    .finite(`${what} must be a finite number of kilograms`)
    .min(0, `${what} cannot be negative`)
    .max(LAUNCH_STACK_MASS_MAX_KG, `${what} must be at most ${LAUNCH_STACK_MASS_MAX_KG} kg`);
const lengthM = (what: string) =>
  z
    .number({ invalid_type_error: `${what} must be a number of metres` })
    .finite(`${what} must be a finite number of metres`)
    .positive(`${what} must be more than 0 m`)
    .max(MODEL_LENGTH_MAX_M, `${what} must be at most ${MODEL_LENGTH_MAX_M} m`);

export const FairingSchema = z
  .object({
    /** Inner diameter of the fairing's cylinder, m. */
    diameterM: lengthM('the fairing diameter'),
    /** Height of the cylinder above the adapter's base, m. */
    cylinderHeightM: lengthM('the fairing cylinder height'),
    /** Height of the cone above the cylinder, m; 0 for none. */
    coneHeightM: z.number().finite().min(0, 'the cone height cannot be negative').max(MODEL_LENGTH_MAX_M),
    /** Gap to keep between the stack and the fairing wall, m. */
    clearanceM: z.number().finite().min(0, 'the clearance cannot be negative').max(MODEL_LENGTH_MAX_M).default(0),
  })
  .strict();

// The height check runs only on a valid body: bodyBaseM walks every facet, so it must not see `facets: 1e308`.
export const LaunchStackInputSchema = refineValid(
  z
    .object({
      /** The probe's body (stowed), as the model engine describes it. */
      body: BodySchema,
      stack: LaunchStackSchema,
      probeMassKg: massKg('the probe mass'),
      /** Height of one probe's centre of mass above its own base, m; mid-height when left out. */
      probeCentreOfMassM: z.number().finite().min(0).max(MODEL_LENGTH_MAX_M).optional(),
      ringMassKg: massKg('the ring mass').default(0),
      adapterMassKg: massKg('the adapter mass'),
      fairing: FairingSchema,
    })
    .strict(),
  (v, ctx) => {
    const h = bodyBaseM(v.body).heightM;
    if (v.probeCentreOfMassM !== undefined && v.probeCentreOfMassM > h) {
      ctx.addIssue({
        code: 'custom',
        path: ['probeCentreOfMassM'],
        message: `the probe's centre of mass (${v.probeCentreOfMassM} m) must lie within its height (${h} m)`,
      });
    }
  },
);
export type LaunchStackInput = z.infer<typeof LaunchStackInputSchema>;
export type Fairing = z.infer<typeof FairingSchema>;

export interface LaunchStackPartResult {
  role: StackPartRole;
  label: string;
  bottomM: number;
  topM: number;
  radiusM: number;
  massKg: number;
  /** Room left between the part's farthest corner and the fairing (less the clearance) at its top, m; < 0 when it does not fit. */
  marginM: number;
  fits: boolean;
}

export interface LaunchStackResult {
  probes: number;
  heightM: number;
  totalMassKg: number;
  /** Height of the centre of mass above the adapter's base, m, and as a fraction of the stack height. */
  centreOfMassM: number;
  centreOfMassFraction: number;
  /** Widest corner of any part from the axis, m. */
  maxRadiusM: number;
  fits: boolean;
  /** Smallest margin of any part, m (negative when something sticks out). */
  minMarginM: number;
  parts: LaunchStackPartResult[];
  /** Most probes of this kind that fit this fairing on this adapter (0 when not even one). */
  maxProbesThatFit: number;
  /** Shortest fairing cylinder that holds this stack with the same cone, m; null when the stack is too wide for any. */
  cylinderHeightNeededM: number | null;
  /** Narrowest fairing diameter that holds every part in the cylinder, m. */
  diameterNeededM: number;
  /** What to change, in plain words; empty when it fits. */
  advice: string[];
}

/** Usable radius of the fairing at height zM above the adapter's base, m (negative above the tip). */
export function fairingRadiusAtM(f: Fairing, zM: number): number {
  const R = f.diameterM / 2;
  const above = zM - f.cylinderHeightM;
  if (above <= 0) return R - f.clearanceM;
  if (f.coneHeightM === 0) return -f.clearanceM;
  return R * (1 - above / f.coneHeightM) - f.clearanceM;
}

const partMargin = (f: Fairing, p: StackPart) => fairingRadiusAtM(f, p.topM) - p.radiusM;
const fmt = (m: number) => `${+m.toFixed(2)} m`;

/** The shortest cylinder (same diameter and cone) that holds every part, m; null if a part is wider than it. */
function cylinderNeededM(f: Fairing, parts: readonly StackPart[]): number | null {
  let need = 0;
  for (const p of parts) {
    const room = f.diameterM / 2 - f.clearanceM - p.radiusM;
    if (room < 0) return null;
    // Inside the cone the envelope narrows linearly: the part's top may reach H_c + H_k·(room / R).
    need = Math.max(need, p.topM - (f.coneHeightM * room) / (f.diameterM / 2));
  }
  return need;
}

/** Height, centre of mass, fit in the fairing and advice for a stack of identical probes. */
export function launchStackAnalyse(input: LaunchStackInput): LaunchStackResult {
  const parts = launchStackParts(input.body, input.stack);
  const mass = (p: StackPart) =>
    p.role === 'probe' ? input.probeMassKg : p.role === 'ring' ? input.ringMassKg : input.adapterMassKg;
  const comOf = (p: StackPart) =>
    p.role === 'probe' && input.probeCentreOfMassM !== undefined
      ? p.bottomM + input.probeCentreOfMassM
      : (p.bottomM + p.topM) / 2;
  const totalMassKg = parts.reduce((s, p) => s + mass(p), 0);
  if (!(totalMassKg > 0)) {
    throw new InputError('Give the probes or the adapter a mass above 0 kg; the centre of mass needs one.', {
      probeMassKg: ['more than 0 kg for probes or adapter'],
    });
  }
  const centreOfMassM = parts.reduce((s, p) => s + mass(p) * comOf(p), 0) / totalMassKg;
  const heightM = parts.at(-1)!.topM;
  const rows = parts.map((p): LaunchStackPartResult => ({
    role: p.role,
    label: p.label,
    bottomM: p.bottomM,
    topM: p.topM,
    radiusM: p.radiusM,
    massKg: mass(p),
    marginM: partMargin(input.fairing, p),
    fits: partMargin(input.fairing, p) >= 0,
  }));
  const fits = rows.every((r) => r.fits);
  let maxProbesThatFit = 0;
  for (let n = 1; n <= Math.max(input.stack.count, 1); n++) {
    const trial = launchStackParts(input.body, { ...input.stack, count: n });
    if (trial.every((p) => partMargin(input.fairing, p) >= 0)) maxProbesThatFit = n;
    else break;
  }
  const cylinderHeightNeededM = cylinderNeededM(input.fairing, parts);
  const maxRadiusM = Math.max(...parts.map((p) => p.radiusM));
  const diameterNeededM = 2 * (maxRadiusM + input.fairing.clearanceM);
  const advice: string[] = [];
  if (!fits) {
    const wide = rows.filter((r) => r.radiusM > input.fairing.diameterM / 2 - input.fairing.clearanceM);
    if (wide.length > 0) {
      advice.push(
        `${wide[0]!.label} is too wide: it needs a fairing at least ${fmt(diameterNeededM)} across (this one is ${fmt(input.fairing.diameterM)}), or a narrower ${wide[0]!.role === 'probe' ? 'probe' : 'part'}.`,
      );
    } else {
      const over = cylinderHeightNeededM! - input.fairing.cylinderHeightM;
      advice.push(
        `The stack is too tall for this fairing: its cylinder would need to be ${fmt(over)} longer (${fmt(cylinderHeightNeededM!)}).`,
      );
      if (maxProbesThatFit > 0 && maxProbesThatFit < input.stack.count) {
        advice.push(
          `${maxProbesThatFit} probe${maxProbesThatFit === 1 ? '' : 's'} would fit: launch the rest on another rocket.`,
        );
      }
      if (over < input.stack.adapter.heightM) {
        advice.push(`Or make the adapter ${fmt(over)} shorter, which lowers every probe by as much.`);
      }
    }
  }
  return {
    probes: input.stack.count,
    heightM,
    totalMassKg,
    centreOfMassM,
    centreOfMassFraction: centreOfMassM / heightM,
    maxRadiusM,
    fits,
    minMarginM: Math.min(...rows.map((r) => r.marginM)),
    parts: rows,
    maxProbesThatFit,
    cylinderHeightNeededM,
    diameterNeededM,
    advice,
  };
}
