/**
 * Test meshes made by three.js (a reference library from the npm registry, independent of the importer):
 * the five Platonic solids, a subdivided icosphere and a torus, plus two star-shaped non-convex solids built
 * here (a five-pointed star prism and a spiky icosahedron), written out as STL or OBJ bytes the way a modelling
 * program would.
 */
import * as THREE from 'three';
import { STLExporter } from 'three/examples/jsm/exporters/STLExporter.js';
import { OBJExporter } from 'three/examples/jsm/exporters/OBJExporter.js';
import polygonClipping, { type Polygon } from 'polygon-clipping';
import type { Piece, Vec2Mm } from '../../../src/lib/geometry/types';
import type { ParsedMesh } from '../../../src/lib/mesh/mesh-types';

export type Soup = number[][][]; // triangles → 3 points → xyz

export function geometrySoup(g: THREE.BufferGeometry): Soup {
  const geo = g.index ? g.toNonIndexed() : g;
  const p = geo.getAttribute('position');
  const out: Soup = [];
  for (let i = 0; i < p.count; i += 3) out.push([0, 1, 2].map((k) => [p.getX(i + k), p.getY(i + k), p.getZ(i + k)]));
  return out;
}

/** A soup as the parser would hand it over: every corner its own vertex; one group unless named per triangle. */
export function soupMesh(soup: Soup, groups: string[] = ['Mesh'], triangleGroup?: number[]): ParsedMesh {
  const n = soup.length;
  return {
    positions: Float64Array.from(soup.flat(2)),
    triangles: Uint32Array.from({ length: n * 3 }, (_, i) => i),
    triangleGroup: triangleGroup ? Uint16Array.from(triangleGroup) : new Uint16Array(n),
    groups,
  };
}

/** Signed volume by the divergence theorem (sum of origin tetrahedra), with three.js vector arithmetic. */
export function meshVolume(m: ParsedMesh): number {
  let v = 0;
  const p = m.positions;
  for (let t = 0; t < m.triangles.length; t += 3) {
    const [a, b, c] = [0, 1, 2].map((k) => new THREE.Vector3().fromArray(p, m.triangles[t + k]! * 3));
    v += a!.dot(b!.clone().cross(c!)) / 6;
  }
  return v;
}

export const PLATONIC = {
  tetrahedron: {
    make: () => new THREE.TetrahedronGeometry(50),
    F: 4,
    E: 6,
    V: 4,
    area: (a: number) => Math.sqrt(3) * a * a,
  },
  cube: { make: () => new THREE.BoxGeometry(60, 60, 60), F: 6, E: 12, V: 8, area: (a: number) => 6 * a * a },
  octahedron: {
    make: () => new THREE.OctahedronGeometry(50),
    F: 8,
    E: 12,
    V: 6,
    area: (a: number) => 2 * Math.sqrt(3) * a * a,
  },
  dodecahedron: {
    make: () => new THREE.DodecahedronGeometry(50),
    F: 12,
    E: 30,
    V: 20,
    area: (a: number) => 3 * Math.sqrt(25 + 10 * Math.sqrt(5)) * a * a,
  },
  icosahedron: {
    make: () => new THREE.IcosahedronGeometry(50),
    F: 20,
    E: 30,
    V: 12,
    area: (a: number) => 5 * Math.sqrt(3) * a * a,
  },
} as const;
// Counts and areas from the textbook table of the regular polyhedra (e.g. CRC Standard Mathematical Tables,
// "Polyhedra"; Euler's V − E + F = 2 holds for each row).

export function stlBytes(soup: Soup, binary: boolean): Uint8Array {
  const mesh = new THREE.Mesh(soupGeometry(soup));
  const out = new STLExporter().parse(mesh, { binary });
  if (typeof out === 'string') return new TextEncoder().encode(out);
  return new Uint8Array(out.buffer, out.byteOffset, out.byteLength);
}

export function objBytes(soup: Soup): Uint8Array {
  return new TextEncoder().encode(new OBJExporter().parse(new THREE.Mesh(soupGeometry(soup))));
}

function soupGeometry(soup: Soup): THREE.BufferGeometry {
  const g = new THREE.BufferGeometry();
  g.setAttribute('position', new THREE.Float32BufferAttribute(soup.flat(2), 3));
  g.computeVertexNormals();
  return g;
}

/** A five-pointed star prism: two non-convex decagon caps and ten walls (20 caps triangles as a fan from the centre). */
export function starPrismSoup(outer = 50, inner = 20, height = 30): Soup {
  const ring = Array.from({ length: 10 }, (_, i) => {
    const r = i % 2 === 0 ? outer : inner;
    const a = (i * Math.PI) / 5;
    return [r * Math.cos(a), r * Math.sin(a)];
  });
  const out: Soup = [];
  for (let i = 0; i < 10; i++) {
    const [x0, y0] = ring[i]!,
      [x1, y1] = ring[(i + 1) % 10]!;
    out.push([
      [0, 0, height],
      [x0!, y0!, height],
      [x1!, y1!, height],
    ]);
    out.push([
      [0, 0, 0],
      [x1!, y1!, 0],
      [x0!, y0!, 0],
    ]);
    out.push([
      [x0!, y0!, 0],
      [x1!, y1!, 0],
      [x1!, y1!, height],
    ]);
    out.push([
      [x0!, y0!, 0],
      [x1!, y1!, height],
      [x0!, y0!, height],
    ]);
  }
  return out;
}

/** An icosahedron with a tall pyramid on every face: a spiky star-shaped solid, 60 triangles. */
export function spikySoup(radius = 40, spike = 2.2): Soup {
  const ico = geometrySoup(new THREE.IcosahedronGeometry(radius));
  const out: Soup = [];
  for (const [a, b, c] of ico) {
    const m = [0, 1, 2].map((k) => (a![k]! + b![k]! + c![k]!) / 3);
    const len = Math.hypot(m[0]!, m[1]!, m[2]!);
    const apex = m.map((x) => (x / len) * radius * spike);
    out.push([a!, b!, apex], [b!, c!, apex], [c!, a!, apex]);
  }
  return out;
}

/** Total area of overlap between faces, and between tabs and faces/tabs, of one piece (polygon-clipping). */
export function pieceOverlapAreaMm2(piece: Piece): number {
  const polys: Vec2Mm[][] = [...piece.hinge.faces.map((f) => f.polygonMm), ...piece.tabs.map((t) => t.polygonMm)];
  const boxes = polys.map(box);
  let area = 0;
  for (let i = 0; i < polys.length; i++)
    for (let j = i + 1; j < polys.length; j++) {
      const a = boxes[i]!,
        b = boxes[j]!;
      if (a[0] >= b[2] || b[0] >= a[2] || a[1] >= b[3] || b[1] >= a[3]) continue;
      const inter = polygonClipping.intersection(ring(polys[i]!), ring(polys[j]!));
      for (const poly of inter) for (const [k, r] of poly.entries()) area += (k === 0 ? 1 : -1) * Math.abs(shoelace(r));
    }
  return area;
}

function box(p: Vec2Mm[]): [number, number, number, number] {
  const xs = p.map((q) => q[0]),
    ys = p.map((q) => q[1]);
  return [Math.min(...xs), Math.min(...ys), Math.max(...xs), Math.max(...ys)];
}

// Snapped to 1 nm: polygon-clipping fails on corners shared to within rounding.
const snap = (x: number) => Math.round(x * 1e6) / 1e6;
const ring = (p: Vec2Mm[]): Polygon => [p.map((q) => [snap(q[0]), snap(q[1])] as [number, number])];

function shoelace(r: [number, number][]): number {
  let s = 0;
  for (let i = 0; i < r.length; i++) {
    const a = r[i]!,
      b = r[(i + 1) % r.length]!;
    s += a[0] * b[1] - a[1] * b[0];
  }
  return s / 2;
}
