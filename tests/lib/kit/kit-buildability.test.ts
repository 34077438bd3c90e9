/**
 * Each demo model at its suggested scale for grades 6–8 on Letter and A4 meets every buildability minimum,
 * measured on the laid-out sheets (placed piece geometry), not on the settings. The measures here are brute
 * force and independent of buildability.ts: widths by sweeping a caliper through every half degree, gaps by
 * sampling along each fold.
 */
import { describe, expect, test } from 'vitest';
import { BUILDABILITY_MINIMUMS } from '../../../src/lib/geometry/buildability';
import type { Vec2Mm } from '../../../src/lib/geometry/types';
import type { SheetVec2Mm } from '../../../src/lib/layout/types';
import { buildKit } from '../../../src/lib/kit/build-kit';
import { KitRequestSchema } from '../../../src/lib/kit/kit-request';
import { placementApply } from '../../../src/lib/layout/placement';
import { solvePaperScale } from '../../../src/lib/layout/scale-solver';
import { fixtureFonts } from '../../fixtures/pieces/kit-layout';
import { DEMO_IDS, demoModel } from '../geometry/fixtures';

const fonts = fixtureFonts();
const min = BUILDABILITY_MINIMUMS['6-8'];

/** Smallest extent of points over directions 0…180° in half-degree steps (an upper bound within 0.004 %). */
function sweptWidthMm(points: readonly SheetVec2Mm[]): number {
  let best = Infinity;
  for (let i = 0; i < 360; i++) {
    const a = (i * Math.PI) / 360;
    const [c, s] = [Math.cos(a), Math.sin(a)];
    let lo = Infinity;
    let hi = -Infinity;
    for (const [x, y] of points) {
      const d = x * c + y * s;
      lo = Math.min(lo, d);
      hi = Math.max(hi, d);
    }
    best = Math.min(best, hi - lo);
  }
  return best;
}

/** Distance from p to segment ab. */
function pointSegment(p: SheetVec2Mm, a: SheetVec2Mm, b: SheetVec2Mm): number {
  const [dx, dy] = [b[0] - a[0], b[1] - a[1]];
  const t = Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / (dx * dx + dy * dy || 1)));
  return Math.hypot(p[0] - a[0] - t * dx, p[1] - a[1] - t * dy);
}

/** Gap between two folds by sampling 200 points along each against the other (0 when they touch). */
function sampledGapMm(f: [SheetVec2Mm, SheetVec2Mm], g: [SheetVec2Mm, SheetVec2Mm]): number {
  let best = Infinity;
  for (const [p, q] of [
    [f, g],
    [g, f],
  ] as const) {
    for (let i = 0; i <= 200; i++) {
      const t = i / 200;
      const x: SheetVec2Mm = [p[0][0] + t * (p[1][0] - p[0][0]), p[0][1] + t * (p[1][1] - p[0][1])];
      best = Math.min(best, pointSegment(x, q[0], q[1]));
    }
  }
  return best;
}

describe.each(DEMO_IDS)('%s for grades 6–8', (id) => {
  test.each(['letter', 'a4'] as const)(
    'at its suggested scale on %s meets every minimum as laid out',
    async (sheetId) => {
      const model = demoModel(id);
      const { scaleDenominator } = solvePaperScale(model, { sheetId, paperGsm: 160, gradeBand: '6-8' });
      const request = KitRequestSchema.parse({
        model,
        scaleDenominator,
        sheetSizeId: sheetId,
        paperGsm: 160,
        gradeBand: '6-8',
        qrUrl: null,
      });
      const { layout } = await buildKit(request, fonts, { outputs: [] });
      const byId = new Map(layout.pieces.map((p) => [p.id, p]));
      const seen = new Set<string>();
      for (const sheet of layout.sheets) {
        for (const placement of sheet.placements) {
          if (seen.has(placement.pieceId)) continue;
          seen.add(placement.pieceId);
          const piece = byId.get(placement.pieceId)!;
          const at = (p: Vec2Mm) => placementApply(placement, p);
          const where = `${id} 1:${scaleDenominator} ${sheetId} ${piece.id}`;
          const faces = piece.hinge.faces.map((f) => f.polygonMm.map(at));
          expect(sweptWidthMm(faces.flat()), `${where} piece`).toBeGreaterThanOrEqual(min.pieceMm - 1e-6);
          for (const face of faces)
            expect(sweptWidthMm(face), `${where} strip`).toBeGreaterThanOrEqual(min.stripMm - 1e-6);
          const folds = piece.folds.map((f) => [at(f.fromMm), at(f.toMm)] as [SheetVec2Mm, SheetVec2Mm]);
          for (const tab of piece.tabs) {
            const fold = piece.folds.find((f) => f.tabNumber === tab.number);
            const polygon = tab.polygonMm.map(at);
            // A folded tab reaches from its fold; a rolled overlap strip (no fold) is as deep as it is wide.
            const depth = fold
              ? Math.min(...polygon.map((p) => pointSegment(p, at(fold.fromMm), at(fold.toMm))).filter((d) => d > 1e-6))
              : sweptWidthMm(polygon);
            expect(depth, `${where} tab ${tab.number}`).toBeGreaterThanOrEqual(min.tabMm - 1e-3);
          }
          for (let i = 0; i < folds.length; i++)
            for (let j = i + 1; j < folds.length; j++) {
              const gap = sampledGapMm(folds[i]!, folds[j]!);
              // Folds meeting at a corner are one crease line's ends, not two creases side by side.
              if (gap > 1e-3) expect(gap, `${where} folds ${i} and ${j}`).toBeGreaterThanOrEqual(min.foldGapMm - 0.05);
            }
        }
      }
      expect(seen.size, `${id} every piece laid out`).toBe(layout.pieces.length);
    },
  );
});
