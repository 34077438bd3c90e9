/** Demo models and helpers shared by the geometry tests (test-only; node:fs allowed here). */
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { ModelContentSchema, ModelSchema, type Model, type ModelInput } from '../../../src/lib/geometry/model-schema';

export const MODELS_DIR = join(import.meta.dirname, '../../../content/models');

export function demoModel(id: string): Model {
  return ModelContentSchema.parse(JSON.parse(readFileSync(join(MODELS_DIR, `${id}.json`), 'utf8'))).model;
}

export const DEMO_IDS = readdirSync(MODELS_DIR)
  .filter((f) => f.endsWith('.json'))
  .map((f) => f.replace(/\.json$/, ''));

export function model(input: Omit<ModelInput, 'schemaVersion' | 'name'>): Model {
  return ModelSchema.parse({ schemaVersion: 1, name: 'Test model', ...input });
}

type V3 = readonly [number, number, number];
export const sub = (a: V3, b: V3): [number, number, number] => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
export const dot = (a: V3, b: V3) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
export const cross = (a: V3, b: V3): [number, number, number] => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];
export const norm = (a: V3) => Math.hypot(a[0], a[1], a[2]);

/** Distance from p to triangle abc (Ericson, Real-Time Collision Detection, §5.1.5). */
export function pointTriangleDistance(p: V3, a: V3, b: V3, c: V3): number {
  const ab = sub(b, a),
    ac = sub(c, a),
    ap = sub(p, a);
  const d1 = dot(ab, ap),
    d2 = dot(ac, ap);
  if (d1 <= 0 && d2 <= 0) return norm(ap);
  const bp = sub(p, b),
    d3 = dot(ab, bp),
    d4 = dot(ac, bp);
  if (d3 >= 0 && d4 <= d3) return norm(bp);
  const vc = d1 * d4 - d3 * d2;
  if (vc <= 0 && d1 >= 0 && d3 <= 0) {
    const v = d1 / (d1 - d3);
    return norm(sub(p, [a[0] + v * ab[0], a[1] + v * ab[1], a[2] + v * ab[2]]));
  }
  const cp = sub(p, c),
    d5 = dot(ab, cp),
    d6 = dot(ac, cp);
  if (d6 >= 0 && d5 <= d6) return norm(cp);
  const vb = d5 * d2 - d1 * d6;
  if (vb <= 0 && d2 >= 0 && d6 <= 0) {
    const w = d2 / (d2 - d6);
    return norm(sub(p, [a[0] + w * ac[0], a[1] + w * ac[1], a[2] + w * ac[2]]));
  }
  const va = d3 * d6 - d5 * d4;
  if (va <= 0 && d4 - d3 >= 0 && d5 - d6 >= 0) {
    const w = (d4 - d3) / (d4 - d3 + (d5 - d6));
    return norm(sub(p, [b[0] + w * (c[0] - b[0]), b[1] + w * (c[1] - b[1]), b[2] + w * (c[2] - b[2])]));
  }
  const n = cross(ab, ac);
  return Math.abs(dot(ap, n)) / norm(n);
}
