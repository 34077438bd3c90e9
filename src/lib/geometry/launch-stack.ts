/**
 * A launch stack: N identical probes (the model's body, stowed) stacked on one launch adapter with a
 * separation ring under each probe, bottom to top: adapter, ring 1, probe 1, ring 2, probe 2, … Rings and
 * the adapter are STACK_DRUM_FACETS-sided drums. The parts, their heights in the stack, their flat patterns
 * (one assembly step per part, bottom first, so the preview builds the stack in order) and their meshes.
 */
import type { Body, LaunchStack, Model } from './model-schema';
import { STACK_DRUM_FACETS } from './model-schema';
import { bodyBaseM, bodyFaces } from './body-shape';
import { bodyNet } from './body-net';
import type { Piece, Vec3Mm } from './types';
import type { BuildGradeBand } from './buildability';

export type StackPartRole = 'adapter' | 'ring' | 'probe';

export interface StackPart {
  role: StackPartRole;
  /** 0 for the adapter; 1-based for rings and probes (ring i sits under probe i). */
  index: number;
  /** Stable id ("adapter", "ring-2", "probe-3") and the name printed on its pieces. */
  id: string;
  label: string;
  body: Body;
  /** Height of the part's base and top above the adapter's base, m. */
  bottomM: number;
  topM: number;
  /** Distance of the part's farthest corner from the stack axis, m. */
  radiusM: number;
}

const drum = (d: { heightM: number; diameterM: number }): Body => ({
  kind: 'cylinder',
  diameterM: d.diameterM,
  heightM: d.heightM,
  facets: STACK_DRUM_FACETS,
});

/** Farthest corner of a body's base polygon from its axis, m. */
export function bodyRadiusM(body: Body): number {
  return Math.max(...bodyBaseM(body).base.map(([x, y]) => Math.hypot(x, y)));
}

/** The parts of a stack of `stack.count` probes of body `probe`, bottom to top. */
export function launchStackParts(probe: Body, stack: LaunchStack): StackPart[] {
  const parts: StackPart[] = [];
  let z = 0;
  const add = (role: StackPartRole, index: number, id: string, label: string, body: Body) => {
    const h = bodyBaseM(body).heightM;
    parts.push({ role, index, id, label, body, bottomM: z, topM: z + h, radiusM: bodyRadiusM(body) });
    z += h;
  };
  add('adapter', 0, 'adapter', 'Launch adapter', drum(stack.adapter));
  for (let i = 1; i <= stack.count; i++) {
    add('ring', i, `ring-${i}`, `Separation ring ${i}`, drum(stack.ring));
    add('probe', i, `probe-${i}`, `Probe ${i}`, probe);
  }
  return parts;
}

/**
 * Every piece of a stack model at 1:scaleDenominator for a class of `band`: each part's body net lifted to its
 * place, bottom first.
 */
export function launchStackPieces(model: Model, scaleDenominator: number, gsm: number, band: BuildGradeBand): Piece[] {
  const k = 1000 / scaleDenominator;
  let number = 0;
  const next = () => ++number;
  return launchStackParts(model.body, model.stack!).flatMap((part, i) =>
    bodyNet(part.body, scaleDenominator, gsm, band, next, i + 1).pieces.map((p): Piece => ({
      ...p,
      id: `${part.id}-${p.id}`,
      partId: part.id,
      label: p.label === 'Body' ? part.label : `${part.label}: ${p.label.toLowerCase()}`,
      hinge: {
        ...p.hinge,
        rootFrame: { ...p.hinge.rootFrame, originMm: lift(p.hinge.rootFrame.originMm, part.bottomM * k) },
      },
    })),
  );
}

/** Base and top rings of every part of a stack model, model mm at kit scale, for closed lofts. */
export function launchStackLoftRings(model: Model, scaleDenominator: number): { bottom: Vec3Mm[]; top: Vec3Mm[] }[] {
  const k = 1000 / scaleDenominator;
  return launchStackParts(model.body, model.stack!).map((part) => {
    const sides = bodyFaces(part.body, scaleDenominator).slice(0, -2);
    return {
      bottom: sides.map((f) => lift(f.polygonMm[0]!, part.bottomM * k)),
      top: sides.map((f) => lift(f.polygonMm[3]!, part.bottomM * k)),
    };
  });
}

const lift = (p: Vec3Mm, dzMm: number): Vec3Mm => [p[0], p[1], p[2] + dzMm];
