import { describe, expect, it } from 'vitest';
import { meshKitSummaryWords } from '../../../src/lib/ui/mesh-kit-summary-words';
import type { MeshKitSummary } from '../../../src/lib/kit/mesh-kit-summary';

const CUBE: MeshKitSummary = {
  faceCount: 6,
  pieceCount: 1,
  cutLengthMm: 1234,
  tabCount: 7,
  tapedEdgeCount: 0,
  oversizeFaceCount: 0,
  foldBackDeviationMm: 1e-9,
  sheetCount: 1,
  sizeMm: 60,
  tabDepthMm: 8,
  foldBackOk: true,
};

describe('meshKitSummaryWords', () => {
  it('reads a one-piece kit that fits and folds back', () => {
    expect(meshKitSummaryWords(CUBE, 10, 'US Letter')).toEqual([
      "At 1:10 the model's longest side is 6 cm.",
      '1 piece to cut out, from 6 faces.',
      '1 sheet of US Letter.',
      '1.23 m of cutting in all, tabs included.',
      '7 glue tabs (8 mm deep on this paper).',
      'Every glued edge has a tab: no tape needed.',
      'Every face fits on the sheet.',
      'Fold-back check passed: folded along its folds, every piece lands back on the model.',
    ]);
  });

  it('says what to tape, what is too large and how far a failed fold-back misses', () => {
    const words = meshKitSummaryWords(
      { ...CUBE, tapedEdgeCount: 1, oversizeFaceCount: 2, foldBackOk: false, foldBackDeviationMm: 2.5 },
      10,
      'A4',
    );
    expect(words).toContain('1 edge has no room for a tab: tape it.');
    expect(words).toContain('2 faces are larger than the sheet: choose a smaller scale or a bigger sheet.');
    expect(words.at(-1)).toMatch(/^Fold-back check failed: a folded piece misses the model by up to 2\.5 mm/);
  });
});
