/**
 * Small vector helpers for the model engine: 2D points in a piece's flat plane and 3D points in model space,
 * both millimetres at kit scale. Pure functions on readonly tuples.
 */
import type { Vec2Mm, Vec3Mm } from './types';

export const vec2Add = (a: Vec2Mm, b: Vec2Mm): Vec2Mm => [a[0] + b[0], a[1] + b[1]];
export const vec2Sub = (a: Vec2Mm, b: Vec2Mm): Vec2Mm => [a[0] - b[0], a[1] - b[1]];
export const vec2Scale = (a: Vec2Mm, k: number): Vec2Mm => [a[0] * k, a[1] * k];
export const vec2Dot = (a: Vec2Mm, b: Vec2Mm): number => a[0] * b[0] + a[1] * b[1];
export const vec2Cross = (a: Vec2Mm, b: Vec2Mm): number => a[0] * b[1] - a[1] * b[0];
export const vec2Length = (a: Vec2Mm): number => Math.hypot(a[0], a[1]);

/** The unit vector along a; the zero vector stays zero. */
export function vec2Unit(a: Vec2Mm): Vec2Mm {
  const l = vec2Length(a);
  return l === 0 ? [0, 0] : [a[0] / l, a[1] / l];
}

/** a rotated a quarter turn counter-clockwise (y up). */
export const vec2Perp = (a: Vec2Mm): Vec2Mm => [-a[1], a[0]];

export const vec3Add = (a: Vec3Mm, b: Vec3Mm): Vec3Mm => [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
export const vec3Sub = (a: Vec3Mm, b: Vec3Mm): Vec3Mm => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
export const vec3Scale = (a: Vec3Mm, k: number): Vec3Mm => [a[0] * k, a[1] * k, a[2] * k];
export const vec3Dot = (a: Vec3Mm, b: Vec3Mm): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
export const vec3Length = (a: Vec3Mm): number => Math.hypot(a[0], a[1], a[2]);

export function vec3Cross(a: Vec3Mm, b: Vec3Mm): Vec3Mm {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

/** The unit vector along a; the zero vector stays zero. */
export function vec3Unit(a: Vec3Mm): Vec3Mm {
  const l = vec3Length(a);
  return l === 0 ? [0, 0, 0] : [a[0] / l, a[1] / l, a[2] / l];
}

/** Sum of k_i · v_i, for building points from frames. */
export function vec3Combine(...terms: [number, Vec3Mm][]): Vec3Mm {
  let x = 0,
    y = 0,
    z = 0;
  for (const [k, v] of terms) {
    x += k * v[0];
    y += k * v[1];
    z += k * v[2];
  }
  return [x, y, z];
}

/** Signed area of a flat polygon, mm² (shoelace formula); positive when counter-clockwise. */
export function polygonArea(points: readonly Vec2Mm[]): number {
  let twice = 0;
  for (let i = 0; i < points.length; i++) {
    const a = points[i]!;
    const b = points[(i + 1) % points.length]!;
    twice += a[0] * b[1] - b[0] * a[1];
  }
  return twice / 2;
}

/** Newell's normal of a 3D polygon (unit; zero for a degenerate polygon). */
export function polygonNormal3(points: readonly Vec3Mm[]): Vec3Mm {
  let x = 0,
    y = 0,
    z = 0;
  for (let i = 0; i < points.length; i++) {
    const a = points[i]!;
    const b = points[(i + 1) % points.length]!;
    x += (a[1] - b[1]) * (a[2] + b[2]);
    y += (a[2] - b[2]) * (a[0] + b[0]);
    z += (a[0] - b[0]) * (a[1] + b[1]);
  }
  return vec3Unit([x, y, z]);
}

/** Axis-aligned bounds of flat points, mm; empty input gives a zero box at the origin. */
export function pointsBounds(points: readonly Vec2Mm[]): { minX: number; minY: number; maxX: number; maxY: number } {
  if (points.length === 0) return { minX: 0, minY: 0, maxX: 0, maxY: 0 };
  let minX = Infinity,
    minY = Infinity,
    maxX = -Infinity,
    maxY = -Infinity;
  for (const [x, y] of points) {
    if (x < minX) minX = x;
    if (y < minY) minY = y;
    if (x > maxX) maxX = x;
    if (y > maxY) maxY = y;
  }
  return { minX, minY, maxX, maxY };
}
