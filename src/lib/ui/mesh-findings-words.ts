/**
 * What the import check found in a mesh file, as sentences for a teacher: one per kind of finding, counts of
 * zero left out, in the order a reader meets them (what was read, what was merged or dropped, what is odd).
 */
import type { MeshFindings } from '../mesh/mesh-repair';

const COUNT = new Intl.NumberFormat('en-US');

type Phrase = [one: string, many: string];

/** Each finding as a phrase after its count, singular and plural. */
const PHRASES: Record<keyof MeshFindings, Phrase> = {
  trianglesRead: ['triangle read from the file', 'triangles read from the file'],
  duplicateVerticesMerged: ['duplicate vertex merged', 'duplicate vertices merged'],
  degenerateTriangles: ['triangle with no area', 'triangles with no area'],
  duplicateTriangles: ['triangle repeated', 'triangles repeated'],
  windingFlipped: [
    'triangle facing the other way from its neighbours',
    'triangles facing the other way from their neighbours',
  ],
  shells: ['separate surface (shell)', 'separate surfaces (shells)'],
  shellsTurnedOutward: ['shell that was inside out', 'shells that were inside out'],
  openBoundaryEdges: ['edge on an open boundary (a free paper edge)', 'edges on an open boundary (free paper edges)'],
  nonManifoldEdges: ['edge shared by more than two faces', 'edges shared by more than two faces'],
  nonManifoldVertices: [
    'vertex where surfaces touch at a single point',
    'vertices where surfaces touch at a single point',
  ],
  selfIntersections: [
    'place where the surface passes through itself',
    'places where the surface passes through itself',
  ],
  shellsCrossing: ['pair of triangles where two shells cross', 'pairs of triangles where shells cross'],
};

/** "12 triangles read from the file", … for every finding above zero; unknown keys are ignored. */
export function meshFindingsWords(findings: Partial<MeshFindings>): string[] {
  const out: string[] = [];
  for (const [key, [one, many]] of Object.entries(PHRASES) as [keyof MeshFindings, Phrase][]) {
    const n = findings[key];
    if (typeof n !== 'number' || !Number.isFinite(n) || n <= 0) continue;
    out.push(`${COUNT.format(n)} ${n === 1 ? one : many}`);
  }
  return out;
}
