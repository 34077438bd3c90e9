/**
 * The print target of a kit's STL, as paper is the target of its sheets: a print bed (a preset or a custom
 * size) and a nozzle. The parts (geometry/print-parts.ts) are laid out side by side on one plate in rows,
 * in gluing order; a boom longer than the bed becomes a stick cut to length (stated), as a too-fine paper boom
 * does, and the scale solver picks the largest usual scale whose plate fits the bed.
 */
import { InputError } from '../errors';
import type { Model } from '../geometry/model-schema';
import { printParts, printWallMm } from '../geometry/print-parts';
import type { PrintPart, PrintSubstitute } from '../geometry/print-parts';
import type { ModelMesh, Vec3Mm } from '../geometry/types';
import { USUAL_SCALE_DENOMINATORS } from './scale-ratios';

/**
 * Bed sizes by generic name, mm (width × depth × build height). Common practice, no source: the usual
 * classes of desktop printers, from a compact classroom printer to a large-format one.
 */
export const PRINT_BEDS = {
  compact: { label: 'Compact bed, 120 × 120 × 120 mm', widthMm: 120, depthMm: 120, heightMm: 120 },
  small: { label: 'Small bed, 180 × 180 × 180 mm', widthMm: 180, depthMm: 180, heightMm: 180 },
  standard: { label: 'Standard bed, 220 × 220 × 250 mm', widthMm: 220, depthMm: 220, heightMm: 250 },
  large: { label: 'Large bed, 300 × 300 × 300 mm', widthMm: 300, depthMm: 300, heightMm: 300 },
} as const;
export type PrintBedId = keyof typeof PRINT_BEDS;
export const PRINT_BED_IDS = Object.keys(PRINT_BEDS) as [PrintBedId, ...PrintBedId[]];
/** Nozzle diameters offered, mm; 0.4 mm is the usual default (common practice, no source). */
export const PRINT_NOZZLES_MM = [0.25, 0.4, 0.6, 0.8] as const;
export const PRINT_NOZZLE_DEFAULT_MM = 0.4;
/** Limits of a custom bed, mm. */
export const PRINT_BED_MIN_MM = 50;
export const PRINT_BED_MAX_MM = 1000;
/** Clear space between parts on the plate and round its edge, mm (common practice, no source). */
export const PRINT_PART_GAP_MM = 5;

export interface PrintBed {
  widthMm: number;
  depthMm: number;
  heightMm: number;
}
export interface PrintTarget {
  bed: PrintBed;
  nozzleMm: number;
}

/** A part placed on the plate: moved by offsetMm, turned a quarter turn about z when `turned`. */
export interface PlatePart extends PrintPart {
  offsetMm: Vec3Mm;
  turned: boolean;
}
export interface PrintPlate {
  scaleDenominator: number;
  target: PrintTarget;
  parts: PlatePart[];
  substitutes: PrintSubstitute[];
  /** Why the parts do not fit the bed; null when they do. */
  overflow: string | null;
}

/** The parts of a model at 1:N laid out on the bed in rows (shelf packing, gluing order kept). */
export function printPlate(model: Model, scaleDenominator: number, target: PrintTarget): PrintPlate {
  const { parts, substitutes } = printParts(model, scaleDenominator, target);
  const { bed } = target;
  const gap = PRINT_PART_GAP_MM;
  const usable = { w: bed.widthMm - 2 * gap, d: bed.depthMm - 2 * gap };
  const placed: PlatePart[] = [];
  let overflow: string | null = null;
  let [x, y, rowDepth] = [gap, gap, 0];
  for (const part of parts) {
    const [w, d, h] = part.sizeMm;
    const fitsFlat = (w <= usable.w && d <= usable.d) || (d <= usable.w && w <= usable.d);
    if (!fitsFlat && part.insteadWhenLong) {
      const { partId, label, step, attach } = part;
      substitutes.push({ partId, label, step, attach, instead: part.insteadWhenLong });
      continue;
    }
    // A part wider than the bed goes in turned a quarter turn when that makes it fit.
    const turned = w > usable.w && d <= usable.w && w <= usable.d;
    const [pw, pd] = turned ? [d, w] : [w, d];
    if (!overflow && h > bed.heightMm)
      overflow = `the ${part.label} is ${mm(h)} tall, over the bed's ${mm(bed.heightMm)}`;
    if (!overflow && (pw > usable.w || pd > usable.d))
      overflow = `the ${part.label} is ${mm(Math.max(w, d))} long, over the bed's ${mm(Math.max(usable.w, usable.d))} inside its edge`;
    if (x + pw > gap + usable.w && x > gap) [x, y, rowDepth] = [gap, y + rowDepth + gap, 0];
    placed.push({ ...part, offsetMm: [x, y, 0], turned });
    x += pw + gap;
    rowDepth = Math.max(rowDepth, pd);
  }
  if (!overflow && y + rowDepth > gap + usable.d) overflow = 'the parts need more than one plate';
  substitutes.sort((a, b) => a.step - b.step);
  return { scaleDenominator, target, parts: placed, substitutes, overflow };
}

export interface PrintScale {
  plate: PrintPlate;
  explanation: string;
}

/**
 * The scale of the STL: the one asked for when its plate fits the bed, otherwise the largest usual scale
 * (smallest N) that fits, with the reason in words; InputError when even 1:500 does not fit.
 */
export function solvePrintScale(model: Model, target: PrintTarget, preferredDenominator?: number): PrintScale {
  const wall = `walls at least ${mm(printWallMm(target))} (2 × the ${target.nozzleMm} mm nozzle)`;
  if (preferredDenominator !== undefined) {
    const plate = printPlate(model, preferredDenominator, target);
    if (!plate.overflow)
      return { plate, explanation: `1:${preferredDenominator} fits one plate of this bed, ${wall}.` };
    const better = printFitting(model, target, preferredDenominator);
    if (!better) throw printNoFit(plate);
    return {
      plate: better,
      explanation: `At 1:${preferredDenominator} ${plate.overflow}; the print is made at 1:${better.scaleDenominator}, which fits one plate, ${wall}.`,
    };
  }
  const plate = printFitting(model, target, 1);
  if (!plate) throw printNoFit(printPlate(model, USUAL_SCALE_DENOMINATORS.at(-1)!, target));
  return { plate, explanation: `1:${plate.scaleDenominator} is the largest usual scale that fits one plate, ${wall}.` };
}

function printFitting(model: Model, target: PrintTarget, fromDenominator: number): PrintPlate | null {
  for (const n of USUAL_SCALE_DENOMINATORS) {
    if (n < fromDenominator) continue;
    const plate = printPlate(model, n, target);
    if (!plate.overflow) return plate;
  }
  return null;
}

function printNoFit(plate: PrintPlate): InputError {
  return new InputError(`Even at 1:${plate.scaleDenominator} ${plate.overflow}; choose a larger print bed.`, {
    print: ['choose a larger print bed'],
  });
}

/** Every part of the plate in one mesh, each where the plate puts it (separate closed bodies). */
export function printPlateMesh(plate: PrintPlate): ModelMesh {
  const positions: number[] = [];
  const indices: number[] = [];
  for (const part of plate.parts) {
    const base = positions.length / 3;
    const p = part.mesh.positions;
    const [, depth] = part.sizeMm;
    for (let i = 0; i < p.length; i += 3) {
      // A quarter turn: (x, y) → (depth − y, x), which keeps the footprint's corner at the origin.
      const [x, y] = part.turned ? [depth - p[i + 1]!, p[i]!] : [p[i]!, p[i + 1]!];
      positions.push(x + part.offsetMm[0], y + part.offsetMm[1], p[i + 2]! + part.offsetMm[2]);
    }
    for (const i of part.mesh.indices) indices.push(base + i);
  }
  return { positions: Float32Array.from(positions), indices: Uint32Array.from(indices) };
}

function mm(v: number): string {
  return `${v < 10 ? v.toFixed(1) : Math.round(v)} mm`;
}

/** The serialisable limits the builder's print fields are validated with (src/lib/kit/kit-settings.ts). */
export const PRINT_CHOICE_LIMITS = {
  printBedIds: PRINT_BED_IDS,
  printNozzlesMm: PRINT_NOZZLES_MM,
  printBedMinMm: PRINT_BED_MIN_MM,
  printBedMaxMm: PRINT_BED_MAX_MM,
};

/** A print target as a form chooses it: a preset bed by id or a custom size, and the nozzle. */
export type PrintChoice = {
  bed: { kind: 'preset'; id: PrintBedId } | ({ kind: 'custom' } & PrintBed);
  nozzleMm: number;
};

/** The print target of a kit whose request names none. */
export const PRINT_CHOICE_DEFAULT: PrintChoice = {
  bed: { kind: 'preset', id: 'standard' },
  nozzleMm: PRINT_NOZZLE_DEFAULT_MM,
};

/** The bed and nozzle of a choice. */
export function printTargetOf(choice: PrintChoice): PrintTarget {
  const { bed } = choice;
  const size = bed.kind === 'preset' ? PRINT_BEDS[bed.id] : bed;
  return { bed: { widthMm: size.widthMm, depthMm: size.depthMm, heightMm: size.heightMm }, nozzleMm: choice.nozzleMm };
}

/** The bed in words: a preset's label, or "Custom bed, W × D × H mm". */
export function printBedLabel(choice: PrintChoice): string {
  const { bed } = choice;
  return bed.kind === 'preset'
    ? PRINT_BEDS[bed.id].label
    : `Custom bed, ${bed.widthMm} × ${bed.depthMm} × ${bed.heightMm} mm`;
}
