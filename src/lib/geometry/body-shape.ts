/**
 * The body as a right prism on a convex base polygon: regular n-gon, rectangle (box) or many-sided polygon
 * (cylinder). Base vertices are counter-clockwise seen from +z; side wall i runs from vertex i to i+1 and
 * side 0 faces +x. Model space: z up along the body axis, origin at the base centre.
 */
import type { Body } from './body-schema';
import type { Vec3Mm } from './types';
import { vec3Cross, vec3Sub, vec3Unit } from './vec';

/**
 * Small-satellite bodies (x, y, z in m) on a 10 cm unit. Common practice, no source; from memory: the
 * CubeSat design specification gives 1U as 100 × 100 × 113.5 mm and 3U as 100 × 100 × 340.5 mm, rounded
 * here to 34 cm; 6U and 12U are taken as two and four 3U stacks side by side.
 */
export const SMALLSAT_SIZES_M = {
  '1U': [0.1, 0.1, 0.1135],
  '2U': [0.1, 0.1, 0.227],
  '3U': [0.1, 0.1, 0.34],
  '6U': [0.1, 0.2, 0.34],
  '12U': [0.2, 0.2, 0.34],
} as const;

/** The base polygon (m, counter-clockwise seen from +z) and height (m) of a body. */
export function bodyBaseM(body: Body): { base: [number, number][]; heightM: number } {
  if (body.kind === 'box') {
    const [w, d, h] = body.smallsat
      ? SMALLSAT_SIZES_M[body.smallsat]
      : [body.widthM ?? 0, body.depthM ?? 0, body.heightM ?? 0];
    return {
      base: [
        [w / 2, -d / 2],
        [w / 2, d / 2],
        [-w / 2, d / 2],
        [-w / 2, -d / 2],
      ],
      heightM: h,
    };
  }
  const n = body.kind === 'prism' ? body.sides : body.facets;
  // Across flats is twice the apothem R·cos(π/n); for odd n that is the flat-to-corner line's usual reading.
  const circumradiusM =
    body.kind === 'cylinder'
      ? body.diameterM / 2
      : body.across === 'corners'
        ? body.sizeM / 2
        : body.sizeM / (2 * Math.cos(Math.PI / n));
  const base: [number, number][] = [];
  for (let i = 0; i < n; i++) {
    const a = ((2 * i - 1) * Math.PI) / n;
    base.push([circumradiusM * Math.cos(a), circumradiusM * Math.sin(a)]);
  }
  return { base, heightM: body.heightM };
}

export type BodyFaceSize = { kind: 'side'; widthM: number; heightM: number } | { kind: 'cap'; inRadiusM: number };

/** Every face reference of a body with its size in metres (for checking appendage positions). */
export function bodyFaceSizesM(body: Body): Map<string, BodyFaceSize> {
  const { base, heightM } = bodyBaseM(body);
  const faces = new Map<string, BodyFaceSize>();
  let inRadiusM = Infinity;
  base.forEach((a, i) => {
    const b = base[(i + 1) % base.length]!;
    const widthM = Math.hypot(b[0] - a[0], b[1] - a[1]);
    inRadiusM = Math.min(inRadiusM, Math.abs(a[0] * b[1] - a[1] * b[0]) / widthM);
    faces.set(`side:${i}`, { kind: 'side', widthM, heightM });
  });
  faces.set('top', { kind: 'cap', inRadiusM });
  faces.set('bottom', { kind: 'cap', inRadiusM });
  return faces;
}

/** One body face at kit scale: polygon counter-clockwise seen from outside, with its own u, v axes. */
export interface BodyFace {
  ref: string;
  polygonMm: Vec3Mm[];
  centreMm: Vec3Mm;
  uAxis: Vec3Mm;
  vAxis: Vec3Mm;
  normal: Vec3Mm;
}

/** The faces of a body at 1:scaleDenominator, mm: sides in order, then top, then bottom. */
export function bodyFaces(body: Body, scaleDenominator: number): BodyFace[] {
  const k = 1000 / scaleDenominator;
  const { base, heightM } = bodyBaseM(body);
  const h = heightM * k;
  const pts = base.map(([x, y]) => [x * k, y * k] as const);
  const faces: BodyFace[] = pts.map((a, i) => {
    const b = pts[(i + 1) % pts.length]!;
    const u = vec3Unit([b[0] - a[0], b[1] - a[1], 0]);
    const v: Vec3Mm = [0, 0, 1];
    return {
      ref: `side:${i}`,
      polygonMm: [
        [a[0], a[1], 0],
        [b[0], b[1], 0],
        [b[0], b[1], h],
        [a[0], a[1], h],
      ],
      centreMm: [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2, h / 2],
      uAxis: u,
      vAxis: v,
      normal: vec3Cross(u, v),
    };
  });
  faces.push({
    ref: 'top',
    polygonMm: pts.map(([x, y]) => [x, y, h]),
    centreMm: [0, 0, h],
    uAxis: [1, 0, 0],
    vAxis: [0, 1, 0],
    normal: [0, 0, 1],
  });
  faces.push({
    ref: 'bottom',
    polygonMm: [...pts].reverse().map(([x, y]) => [x, y, 0]),
    centreMm: [0, 0, 0],
    uAxis: [1, 0, 0],
    vAxis: [0, -1, 0],
    normal: [0, 0, -1],
  });
  return faces;
}

/** The edge vector of a face polygon from vertex i to i + 1, for callers that walk edges. */
export function bodyFaceEdge(face: BodyFace, i: number): Vec3Mm {
  const p = face.polygonMm;
  return vec3Sub(p[(i + 1) % p.length]!, p[i]!);
}
