import SVGPathCommander from 'svg-path-commander';
import { describe, expect, test } from 'vitest';
import { placementOutline } from '../../../src/lib/layout/placement';
import { svgSheet } from '../../../src/lib/render/svg-sheet';
import { fixtureKit } from '../../fixtures/pieces/kit-layout';

/** The inner text of `<g id="…">…</g>` (groups are not nested in our SVG). */
function group(svg: string, id: string): string {
  const m = new RegExp(`<g id="${id}"([^>]*)>([\\s\\S]*?)</g>`).exec(svg);
  if (!m) throw new Error(`no group ${id}`);
  return `${m[1]}|${m[2]}`;
}

describe('svgSheet', () => {
  const kit = fixtureKit('letter', 'us');
  const svg = svgSheet(kit, kit.sheets[0]!);
  const cubeSheet = kit.sheets.find((s) => s.placements.some((p) => p.pieceId === 'cube'))!;
  const cubeSvg = svgSheet(kit, cubeSheet);

  test('is sized in true millimetres with a viewBox in mm (215.9 × 279.4 for Letter, ASME Y14.1)', () => {
    expect(svg).toMatch(/<svg [^>]*width="215\.9mm" height="279\.4mm" viewBox="0 0 215\.9 279\.4"/);
  });

  test('has separate cut, mountain, valley, labels and artwork groups with the expected elements', () => {
    for (const id of ['cut', 'mountain-folds', 'valley-folds', 'labels', 'artwork', 'furniture'])
      expect(() => group(svg, id)).not.toThrow();
    const pathsIn = (id: string) => (group(cubeSvg, id).match(/<path /g) ?? []).length;
    const onSheet = cubeSheet.placements.length;
    expect(pathsIn('cut')).toBe(onSheet);
    expect(pathsIn('mountain-folds')).toBeGreaterThan(0);
    expect(pathsIn('valley-folds')).toBeGreaterThan(0);
    expect((group(cubeSvg, 'labels').match(/<text /g) ?? []).length).toBeGreaterThanOrEqual(onSheet);
  });

  test('keeps the cut group to stroked paths with no fill, text or other elements', () => {
    const cut = group(svg, 'cut');
    const [attrs, body] = cut.split('|') as [string, string];
    expect(attrs).toContain('fill="none"');
    expect(attrs).toMatch(/stroke="#[0-9a-f]{6}"/);
    expect(body.replace(/<path d="[^"]*"\/>/g, '')).toBe('');
    expect(body).not.toMatch(/fill=/);
  });

  test('places each outline where placementApply puts it (svg-path-commander bbox equals the placed box)', () => {
    const cutPaths = [...group(svg, 'cut').matchAll(/<path d="([^"]*)"/g)].map((m) => m[1]!);
    kit.sheets[0]!.placements.forEach((placement, i) => {
      if (placement.tile) return;
      const piece = kit.pieces.find((p) => p.id === placement.pieceId)!;
      const pts = placementOutline(placement, piece);
      const box = SVGPathCommander.getPathBBox(cutPaths[i]!);
      expect(box.x).toBeCloseTo(Math.min(...pts.map((p) => p[0])), 2);
      expect(box.y).toBeCloseTo(Math.min(...pts.map((p) => p[1])), 2);
      expect(box.width).toBeCloseTo(Math.max(...pts.map((p) => p[0])) - box.x, 2);
    });
  });

  test('clips a tiled piece to its window so no cut runs outside it', () => {
    const tiled = kit.sheets.find((s) => s.placements.some((p) => p.tile))!;
    const w = tiled.placements.find((p) => p.tile)!.tile!.windowMm;
    const cutPaths = [...group(svgSheet(kit, tiled), 'cut').matchAll(/<path d="([^"]*)"/g)].map((m) => m[1]!);
    for (const d of cutPaths) {
      const box = SVGPathCommander.getPathBBox(d);
      expect(box.x).toBeGreaterThanOrEqual(w.xMm - 1e-3);
      expect(box.x + box.width).toBeLessThanOrEqual(w.xMm + w.widthMm + 1e-3);
    }
  });

  test('draws the check square 2 in = 50.8 mm wide in the furniture group', () => {
    const squares = [...group(svg, 'furniture').matchAll(/<path d="([^"]*)" fill="none"/g)]
      .map((m) => SVGPathCommander.getPathBBox(m[1]!))
      .filter((b) => Math.abs(b.width - 50.8) < 1e-3 && Math.abs(b.height - 50.8) < 1e-3);
    expect(squares).toHaveLength(1);
  });

  test('prints the cut list in the furniture group of a stock kit, as text elements', () => {
    const panel = fixtureKit('panel-1220x2440', 'metric');
    const first = group(svgSheet(panel, panel.sheets[0]!), 'furniture');
    const texts = [...first.matchAll(/<text [^>]*>([^<]*)<\/text>/g)].map((m) => m[1]);
    expect(texts).toContain('Cut list');
    // The fixture strip is 400 × 40 mm (tests/fixtures/pieces); the SVG escapes nothing in these cells.
    expect(texts).toContain('Panel long');
    expect(texts).toContain('400 × 40 mm');
    if (panel.sheets[1]) expect(svgSheet(panel, panel.sheets[1])).not.toContain('Cut list');
  });
});
