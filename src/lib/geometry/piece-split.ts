/**
 * Cutting a piece too large for a sheet apart at its folds: the hinge tree loses a joint, each side becomes a
 * piece of its own (its faces, the tabs and edge numbers on them, its own root frame), and the cut edge gets
 * a glue tab on one side and the same number just inside the other, like every other joint. A strip of walls
 * is cut where the two parts come out most even, and each part again until every part fits (or is a single
 * face, which only tiling can print). Flat mm, y up; model mm at kit scale, as in piece-builder.ts.
 */
import { hingeTreeFold } from './hinge-tree';
import { netGluePair, type NetEdge } from './net-glue';
import { paperTabDepthMm } from './paper';
import { pieceFromNet, type NetFace, type NetTab } from './piece-builder';
import type { EdgeLabel, Piece, Vec2Mm } from './types';
import { pointsBounds, vec2Length, vec2Sub } from './vec';

/** One side of a cut: the face indexes it keeps (root first) and the glue added at its cut edges. */
interface SplitPart {
  faces: number[];
  tabs: NetTab[];
  edgeLabels: EdgeLabel[];
}

/** Everything of the whole piece that the parts are cut from, indexed by face. */
interface SplitSource {
  piece: Piece;
  net: NetFace[];
  /** Per face: the piece's tabs that fold on one of its edges (or share one, for an overlap strip). */
  tabsOf: NetTab[][];
  labelsOf: EdgeLabel[][];
  find: NetFinder;
}

/**
 * The piece itself when `fits` accepts it or it has no fold to cut (a curved piece, a single face);
 * otherwise its parts, root part first, each cut at a fold joint, joined by tabs numbered by `nextNumber`
 * (in order of the parts), tabs as deep as paper of `gsm` wants, labelled "<label>, part k of n", with ids
 * "<id>-k".
 */
export function pieceSplit(piece: Piece, fits: (p: Piece) => boolean, gsm: number, nextNumber: () => number): Piece[] {
  if (piece.hinge.curved || piece.hinge.joints.length === 0 || fits(piece)) return [piece];
  const source = splitSource(piece);
  const whole: SplitPart = { faces: wholeOrder(piece), tabs: [], edgeLabels: [] };
  // Search with a placeholder number; the chosen cuts are numbered in order afterwards.
  let placeholder = 0;
  const parts = splitPart(source, whole, fits, gsm, () => --placeholder);
  if (parts.length === 1) return [piece];
  const numbers = new Map<number, number>();
  const renumber = (n: number) => {
    if (n >= 0) return n;
    if (!numbers.has(n)) numbers.set(n, nextNumber());
    return numbers.get(n)!;
  };
  return parts.map((part, k) =>
    splitPiece(
      source,
      {
        faces: part.faces,
        tabs: part.tabs.map((t) => ({ ...t, number: renumber(t.number) })),
        edgeLabels: part.edgeLabels.map((l) => ({ ...l, number: renumber(l.number) })),
      },
      { id: `${piece.id}-${k + 1}`, label: `${piece.label}, part ${k + 1} of ${parts.length}` },
    ),
  );
}

function splitPart(
  source: SplitSource,
  part: SplitPart,
  fits: (p: Piece) => boolean,
  gsm: number,
  placeholder: () => number,
): SplitPart[] {
  const built = splitPiece(source, part, { id: source.piece.id, label: source.piece.label });
  const inside = new Set(part.faces);
  const cuts = source.piece.hinge.joints.filter((j) => inside.has(j.parent) && inside.has(j.child));
  if (fits(built) || cuts.length === 0) return [part];
  let best: { sides: [SplitPart, SplitPart]; misfits: number; largestMm2: number } | null = null;
  for (const joint of evenCuts(cuts, part.faces.length)) {
    const sides = splitAt(source, part, joint, gsm, placeholder());
    const pieces = sides.map((s) => splitPiece(source, s, { id: source.piece.id, label: source.piece.label }));
    const misfits = pieces.filter((p) => !fits(p)).length;
    const largestMm2 = Math.max(...pieces.map((p) => boxAreaMm2(p.outlineMm)));
    if (!best || misfits < best.misfits || (misfits === best.misfits && largestMm2 < best.largestMm2 - 1e-6))
      best = { sides, misfits, largestMm2 };
  }
  return best!.sides.flatMap((s) => splitPart(source, s, fits, gsm, placeholder));
}

/**
 * Joints tried at one cut. Each try builds both sides, so trying every joint of a piece of F faces costs F² face
 * builds: fine for the engine's own pieces (a few dozen faces), minutes for an imported mesh's (hundreds). A part
 * with more joints is tried only at those whose sides come out most even, which is where the cut lands anyway
 * on the long strips and wide nets such parts are (the search's own rule, below: fewest misfits, then the
 * smallest larger side).
 */
export const SPLIT_CUTS_TRIED_MAX = 24;

/** The joints to try, in their tree order: all of them, or the SPLIT_CUTS_TRIED_MAX most even. */
function evenCuts(cuts: Piece['hinge']['joints'], faceCount: number): Piece['hinge']['joints'] {
  if (cuts.length <= SPLIT_CUTS_TRIED_MAX) return cuts;
  const children = new Map<number, number[]>();
  for (const j of cuts) children.set(j.parent, [...(children.get(j.parent) ?? []), j.child]);
  const size = new Map<number, number>();
  const sizeOf = (face: number): number => {
    // Iterative post-order: a long strip is as deep as it is long.
    const stack: [number, boolean][] = [[face, false]];
    while (stack.length > 0) {
      const [f, done] = stack.pop()!;
      if (size.has(f)) continue;
      if (done) size.set(f, 1 + (children.get(f) ?? []).reduce((a, c) => a + size.get(c)!, 0));
      else stack.push([f, true], ...(children.get(f) ?? []).map((c): [number, boolean] => [c, false]));
    }
    return size.get(face)!;
  };
  const unevenness = new Map(cuts.map((j) => [j, Math.abs(2 * sizeOf(j.child) - faceCount)]));
  const kept = new Set(
    [...cuts].sort((a, b) => unevenness.get(a)! - unevenness.get(b)!).slice(0, SPLIT_CUTS_TRIED_MAX),
  );
  return cuts.filter((j) => kept.has(j));
}

/** The two sides of `part` without `joint`: the parent's side keeps the part's root. */
function splitAt(
  source: SplitSource,
  part: SplitPart,
  joint: Piece['hinge']['joints'][number],
  gsm: number,
  number: number,
): [SplitPart, SplitPart] {
  const below = subtree(source.piece, joint.child);
  const childFaces = part.faces.filter((f) => below.has(f));
  const parentFaces = part.faces.filter((f) => !below.has(f));
  const keep = (faces: number[]) => {
    const set = new Set(faces);
    return {
      tabs: part.tabs.filter((t) => set.has(source.find.tabFace(t))),
      labels: part.edgeLabels.filter((l) => set.has(source.find.labelFace(l.atMm))),
    };
  };
  const [p, c] = [keep(parentFaces), keep(childFaces)];
  const parentEdge = faceEdge(source.net, joint.parent, joint.axisMm[0], joint.axisMm[1]);
  const childEdge = faceEdge(source.net, joint.child, joint.axisMm[1], joint.axisMm[0]);
  const obstaclesOf = (faces: number[], tabs: NetTab[]) => [
    ...faces.flatMap((f) => [source.net[f]!.flatMm, ...source.tabsOf[f]!.map((t) => t.polygonMm)]),
    ...tabs.map((t) => t.polygonMm),
  ];
  const edgeMm = vec2Length(vec2Sub(joint.axisMm[1], joint.axisMm[0]));
  const { tab, label } = netGluePair(source.net, parentEdge, childEdge, number, paperTabDepthMm(gsm, edgeMm), (on) =>
    on.face === joint.parent ? obstaclesOf(parentFaces, p.tabs) : obstaclesOf(childFaces, c.tabs),
  );
  const onParent = parentFaces.includes(source.find.tabFace(tab));
  return [
    {
      faces: parentFaces,
      tabs: [...p.tabs, ...(onParent ? [tab] : [])],
      edgeLabels: [...p.labels, ...(onParent ? [] : [label])],
    },
    {
      faces: childFaces,
      tabs: [...c.tabs, ...(onParent ? [] : [tab])],
      edgeLabels: [...c.labels, ...(onParent ? [label] : [])],
    },
  ];
}

/** A part as a piece: its faces re-indexed from its own root, the source's glue on them plus its cut glue. */
function splitPiece(source: SplitSource, part: SplitPart, name: { id: string; label: string }): Piece {
  const { piece, net } = source;
  const index = new Map(part.faces.map((f, i) => [f, i]));
  return pieceFromNet({
    id: name.id,
    partId: piece.partId,
    partKind: piece.partKind,
    label: name.label,
    assemblyStep: piece.assemblyStep,
    faces: part.faces.map((f) => net[f]!),
    joints: piece.hinge.joints
      .filter((j) => index.has(j.parent) && index.has(j.child))
      .map((j) => ({ parent: index.get(j.parent)!, child: index.get(j.child)! })),
    tabs: [...part.faces.flatMap((f) => source.tabsOf[f]!), ...part.tabs],
    edgeLabels: [...part.faces.flatMap((f) => source.labelsOf[f]!), ...part.edgeLabels],
  });
}

function splitSource(piece: Piece): SplitSource {
  const folded = new Map(hingeTreeFold(piece.hinge, 1).map((f) => [f.id, f.polygonMm]));
  const net: NetFace[] = piece.hinge.faces.map((f) => ({ flatMm: f.polygonMm, modelMm: folded.get(f.id)! }));
  const find = netFinder(net);
  const tabsOf: NetTab[][] = net.map(() => []);
  for (const t of piece.tabs) {
    const fold = piece.folds.find((f) => f.tabNumber === t.number);
    const tab: NetTab = fold ? { ...t, fold: { fromMm: fold.fromMm, toMm: fold.toMm, angleRad: fold.angleRad } } : t;
    tabsOf[find.tabFace(tab)]!.push(tab);
  }
  const labelsOf: EdgeLabel[][] = net.map(() => []);
  for (const l of piece.edgeLabels) labelsOf[find.labelFace(l.atMm)]!.push(l);
  return { piece, net, tabsOf, labelsOf, find };
}

/** Face indexes from the root down the tree (parents before children), then any face the tree misses. */
function wholeOrder(piece: Piece): number[] {
  const order = [piece.hinge.root, ...subtreeOrder(piece, piece.hinge.root).slice(1)];
  const inOrder = new Set(order);
  const rest = piece.hinge.faces.map((_, i) => i).filter((i) => !inOrder.has(i));
  return [...order, ...rest];
}

/** Each face's children in joint order, per hinge tree (built once: a mesh piece has hundreds of faces). */
const childrenByTree = new WeakMap<Piece['hinge'], Map<number, number[]>>();

function subtreeOrder(piece: Piece, top: number): number[] {
  let children = childrenByTree.get(piece.hinge);
  if (!children) {
    children = new Map();
    for (const j of piece.hinge.joints) children.set(j.parent, [...(children.get(j.parent) ?? []), j.child]);
    childrenByTree.set(piece.hinge, children);
  }
  const out = [top];
  for (let k = 0; k < out.length; k++) out.push(...(children.get(out[k]!) ?? []));
  return out;
}

const subtree = (piece: Piece, top: number) => new Set(subtreeOrder(piece, top));

const KEY_SCALE = 1e6;
const key = (p: Vec2Mm) => `${Math.round(p[0] * KEY_SCALE)},${Math.round(p[1] * KEY_SCALE)}`;

/** The edge of face `face` that runs from a to b (its polygon order). */
function faceEdge(net: NetFace[], face: number, a: Vec2Mm, b: Vec2Mm): NetEdge {
  const poly = net[face]!.flatMm;
  const edge = poly.findIndex((p, i) => key(p) === key(a) && key(poly[(i + 1) % poly.length]!) === key(b));
  if (edge < 0) throw new Error(`piece-split: face ${face} has no edge ${key(a)}→${key(b)}`);
  return { face, edge };
}

interface NetFinder {
  /** The face a tab belongs to: the one whose edge it folds on, or (an overlap strip) shares an edge with. */
  tabFace(tab: NetTab): number;
  /** The face holding a printed number: the one containing the point, else the nearest by its centre. */
  labelFace(p: Vec2Mm): number;
}

/** Lookups over a net's faces, indexed once: faces by directed edge, and by bounding box. */
function netFinder(net: NetFace[]): NetFinder {
  const byEdge = new Map<string, number>();
  net.forEach((f, i) => {
    for (const [p, q] of ringEdges(f.flatMm))
      if (!byEdge.has(`${key(p)}>${key(q)}`)) byEdge.set(`${key(p)}>${key(q)}`, i);
  });
  const bounds = net.map((f) => pointsBounds(f.flatMm));
  return {
    tabFace(tab) {
      // A tab lies right of its fold a→b and its face left of it, so the face runs the edge the same way; an
      // overlap strip's own outline runs the shared edge the other way round.
      const edges = tab.fold
        ? [[tab.fold.fromMm, tab.fold.toMm] as const]
        : ringEdges(tab.polygonMm).map(([a, b]) => [b, a] as const);
      for (const [a, b] of edges) {
        const face = byEdge.get(`${key(a)}>${key(b)}`);
        if (face !== undefined) return face;
      }
      return 0;
    },
    labelFace(p) {
      const inside = net.findIndex((f, i) => {
        const b = bounds[i]!;
        return p[0] >= b.minX && p[0] <= b.maxX && p[1] >= b.minY && p[1] <= b.maxY && pointInPolygon(p, f.flatMm);
      });
      if (inside >= 0) return inside;
      let best = 0;
      let bestD = Infinity;
      net.forEach((f, i) => {
        const c = f.flatMm.reduce<[number, number]>((s, q) => [s[0] + q[0], s[1] + q[1]], [0, 0]);
        const d = Math.hypot(c[0] / f.flatMm.length - p[0], c[1] / f.flatMm.length - p[1]);
        if (d < bestD) [best, bestD] = [i, d];
      });
      return best;
    },
  };
}

const ringEdges = (poly: readonly Vec2Mm[]) => poly.map((p, i) => [p, poly[(i + 1) % poly.length]!] as const);

function pointInPolygon(p: Vec2Mm, poly: readonly Vec2Mm[]): boolean {
  let inside = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const [a, b] = [poly[i]!, poly[j]!];
    if (a[1] > p[1] !== b[1] > p[1] && p[0] < ((b[0] - a[0]) * (p[1] - a[1])) / (b[1] - a[1]) + a[0]) inside = !inside;
  }
  return inside;
}

function boxAreaMm2(points: readonly Vec2Mm[]): number {
  const b = pointsBounds(points);
  return (b.maxX - b.minX) * (b.maxY - b.minY);
}
