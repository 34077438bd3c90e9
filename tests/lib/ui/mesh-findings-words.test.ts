import { describe, expect, it } from 'vitest';
import { meshFindingsWords } from '../../../src/lib/ui/mesh-findings-words';

describe('meshFindingsWords', () => {
  it('says every finding above zero, singular or plural, and leaves zeros out', () => {
    const words = meshFindingsWords({
      trianglesRead: 12,
      duplicateVerticesMerged: 28,
      degenerateTriangles: 0,
      shells: 1,
      openBoundaryEdges: 3,
      nonManifoldEdges: 0,
      selfIntersections: 1,
    });
    expect(words).toEqual([
      '12 triangles read from the file',
      '28 duplicate vertices merged',
      '1 separate surface (shell)',
      '3 edges on an open boundary (free paper edges)',
      '1 place where the surface passes through itself',
    ]);
  });

  it('groups thousands and ignores counts that are not numbers', () => {
    expect(meshFindingsWords({ trianglesRead: 100000, shells: Number.NaN })).toEqual([
      '100,000 triangles read from the file',
    ]);
  });
});
