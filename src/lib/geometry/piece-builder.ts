/**
 * Turns a net (faces known both flat and in model space, joined by a spanning tree of shared edges) into a
 * Piece: hinge joints with axes and signed angles, fold lines, the outline of faces plus tabs, face area.
 * Flat coordinates mm, y up, CCW; model space mm at kit scale. Each face's model polygon lists its vertices
 * in the same order as its flat polygon, so its Newell normal is the printed side.
 */
import type {
  CurvedDevelopment,
  EdgeLabel,
  FoldLine,
  GlueTab,
  HingeJoint,
  PartKind,
  Piece,
  PlaneFrame,
  Vec2Mm,
  Vec3Mm,
} from './types';
import {
  polygonArea,
  polygonNormal3,
  vec2Length,
  vec2Sub,
  vec2Unit,
  vec3Combine,
  vec3Cross,
  vec3Dot,
  vec3Sub,
  vec3Unit,
} from './vec';

export interface NetFace {
  flatMm: Vec2Mm[];
  modelMm: Vec3Mm[];
}

/** A tab with the fold that joins it to its face (absent for overlap strips that roll with the surface). */
export interface NetTab extends GlueTab {
  fold?: { fromMm: Vec2Mm; toMm: Vec2Mm; angleRad: number };
}

export interface NetPieceSpec {
  id: string;
  partId: string;
  partKind: PartKind;
  label: string;
  assemblyStep: number;
  faces: NetFace[];
  /** Tree edges by face index; the root is face 0. */
  joints: { parent: number; child: number }[];
  tabs: NetTab[];
  edgeLabels: EdgeLabel[];
  curved?: CurvedDevelopment;
  /** Required for curved pieces (their single face is not planar in model space). */
  rootFrame?: PlaneFrame;
}

const KEY_SCALE = 1e6;
const key = (p: Vec2Mm): string => `${Math.round(p[0] * KEY_SCALE)},${Math.round(p[1] * KEY_SCALE)}`;

/** Builds the Piece; throws Error (a programming fault, not user input) if a joint's faces share no edge. */
export function pieceFromNet(spec: NetPieceSpec): Piece {
  const faceKeys = spec.faces.map((f) => f.flatMm.map(key));
  const joints: HingeJoint[] = spec.joints.map(({ parent, child }) => netJoint(spec.faces, faceKeys, parent, child));
  const folds: FoldLine[] = joints.map((j) => ({
    fromMm: j.axisMm[0],
    toMm: j.axisMm[1],
    kind: j.angleRad >= 0 ? 'mountain' : 'valley',
    angleRad: j.angleRad,
  }));
  for (const t of spec.tabs) {
    if (t.fold)
      folds.push({
        fromMm: t.fold.fromMm,
        toMm: t.fold.toMm,
        kind: t.fold.angleRad >= 0 ? 'mountain' : 'valley',
        angleRad: t.fold.angleRad,
        tabNumber: t.number,
      });
  }
  const faces = spec.faces.map((f, id) => ({ id, polygonMm: f.flatMm }));
  return {
    id: spec.id,
    partId: spec.partId,
    partKind: spec.partKind,
    label: spec.label,
    outlineMm: outlineOf([...faces.map((f) => f.polygonMm), ...spec.tabs.map((t) => t.polygonMm)]),
    folds,
    tabs: spec.tabs.map(({ number, polygonMm, labelAtMm, depthMm }) => ({
      number,
      polygonMm,
      labelAtMm,
      ...(depthMm === undefined ? {} : { depthMm }),
    })),
    edgeLabels: spec.edgeLabels,
    hinge: {
      root: 0,
      faces,
      joints,
      rootFrame: spec.rootFrame ?? faceFrame(spec.faces[0]!),
      ...(spec.curved ? { curved: spec.curved } : {}),
    },
    faceAreaMm2: faces.reduce((s, f) => s + polygonArea(f.polygonMm), 0),
    assemblyStep: spec.assemblyStep,
  };
}

/** The joint between two faces sharing an edge; `keys` are the faces' vertex keys (`key`), made once per face. */
function netJoint(faces: NetFace[], keys: string[][], parent: number, child: number): HingeJoint {
  const p = faces[parent]!,
    pk = keys[parent]!,
    c = faces[child]!,
    ck = keys[child]!;
  const parentEdges = new Set(pk.map((k, i) => `${k}>${pk[(i + 1) % pk.length]!}`));
  for (let i = 0; i < c.flatMm.length; i++) {
    const a = c.flatMm[i]!,
      b = c.flatMm[(i + 1) % c.flatMm.length]!;
    if (!parentEdges.has(`${ck[(i + 1) % ck.length]!}>${ck[i]!}`)) continue;
    // The child lies left of a→b (CCW), so right of b→a: with that axis a positive angle folds it backward.
    const axis3 = vec3Unit(vec3Sub(c.modelMm[i]!, c.modelMm[(i + 1) % c.modelMm.length]!));
    const np = polygonNormal3(p.modelMm),
      nc = polygonNormal3(c.modelMm);
    const angleRad = Math.atan2(vec3Dot(vec3Cross(np, nc), axis3), vec3Dot(np, nc));
    return { parent, child, axisMm: [b, a], angleRad };
  }
  throw new Error(`piece-builder: faces ${parent} and ${child} share no edge`);
}

/** The frame placing a planar face's flat plane in model space (flat origin ↦ originMm). */
export function faceFrame(face: NetFace): PlaneFrame {
  const [f0, f1] = [face.flatMm[0]!, face.flatMm[1]!];
  const [p0, p1] = [face.modelMm[0]!, face.modelMm[1]!];
  const e = vec2Unit(vec2Sub(f1, f0));
  const E = vec3Unit(vec3Sub(p1, p0));
  const Eperp = vec3Cross(polygonNormal3(face.modelMm), E);
  const xAxis = vec3Combine([e[0], E], [-e[1], Eperp]);
  const yAxis = vec3Combine([e[1], E], [e[0], Eperp]);
  const originMm = vec3Combine([1, p0], [-f0[0], xAxis], [-f0[1], yAxis]);
  return { originMm, xAxis, yAxis };
}

/**
 * The outer boundary of polygons that meet only along whole shared edges: every edge used once in each
 * direction is interior; the rest chain into the CCW outline (the longest loop if several).
 */
export function outlineOf(polygons: readonly Vec2Mm[][]): Vec2Mm[] {
  // Vertices get small integer ids by key, so an edge is one number (from id × count + to id) and the keys
  // are worked out once per corner rather than twice per edge and again per lookup.
  const ids = new Map<string, number>();
  const idOf = (p: Vec2Mm): number => {
    const k = key(p);
    let id = ids.get(k);
    if (id === undefined) ids.set(k, (id = ids.size));
    return id;
  };
  const corners = polygons.map((poly) => poly.map(idOf));
  const n = ids.size;
  const edges = new Map<number, { from: Vec2Mm; fromId: number; toId: number }>();
  polygons.forEach((poly, k) => {
    const c = corners[k]!;
    for (let i = 0; i < poly.length; i++) {
      const from = poly[i]!,
        to = poly[(i + 1) % poly.length]!;
      if (vec2Length(vec2Sub(to, from)) === 0) continue;
      const fromId = c[i]!,
        toId = c[(i + 1) % poly.length]!;
      const reverse = toId * n + fromId;
      if (edges.has(reverse)) edges.delete(reverse);
      else edges.set(fromId * n + toId, { from, fromId, toId });
    }
  });
  const byStart = new Map<number, { from: Vec2Mm; toId: number }>();
  for (const e of edges.values()) byStart.set(e.fromId, e);
  let best: Vec2Mm[] = [];
  const used = new Set<number>();
  for (const startId of byStart.keys()) {
    if (used.has(startId)) continue;
    const loop: Vec2Mm[] = [];
    let k: number | undefined = startId;
    while (k !== undefined && !used.has(k)) {
      used.add(k);
      const e = byStart.get(k);
      if (!e) break;
      loop.push(e.from);
      k = e.toId;
    }
    if (polygonArea(loop) > polygonArea(best)) best = loop;
  }
  return best;
}
