/**
 * `npx tsx tests/bench/sheet-counts.ts`: sheet counts of every demo kit (content/models) at 1:10, 1:20, 1:25
 * and 1:50 on Letter and A4, for grades 6–8, one copy: how many sheets, how many pieces were split into tiles,
 * and how full the emptiest sheet is (share of its printable area under piece bounding boxes). A script, not a
 * test: it prints a table for the packing rule's before/after report (issue 10, item 5).
 */
import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { buildKit } from '../../src/lib/kit/build-kit';
import { KitRequestSchema } from '../../src/lib/kit/kit-request';
import { kitFonts } from '../../src/lib/kit/fonts.server';
import { placementBounds } from '../../src/lib/layout/placement';

const root = fileURLToPath(new URL('../../', import.meta.url));
const models = readdirSync(`${root}content/models`)
  .filter((f) => f.endsWith('.json'))
  .map((f) => JSON.parse(readFileSync(`${root}content/models/${f}`, 'utf8')) as { id: string; model: unknown });
const fonts = await kitFonts(root);

console.log('model          scale  paper   sheets  tiled pieces  emptiest sheet');
for (const m of models)
  for (const n of [10, 20, 25, 50])
    for (const paper of ['letter', 'a4'] as const) {
      const request = KitRequestSchema.parse({
        model: m.model,
        scaleDenominator: n,
        sheetSizeId: paper,
        units: paper === 'letter' ? 'us' : 'metric',
        gradeBand: '6-8',
        qrUrl: null,
      });
      let row: string;
      try {
        const { layout } = await buildKit(request, fonts, { outputs: [] });
        const byId = new Map(layout.pieces.map((p) => [p.id, p]));
        const tiled = new Set(layout.sheets.flatMap((s) => s.placements.filter((p) => p.tile).map((p) => p.pieceId)));
        const fills = layout.sheets.map((s) => {
          const used = s.placements.reduce((a, pl) => {
            const b = pl.tile ? pl.tile.windowMm : placementBounds(pl, byId.get(pl.pieceId)!);
            return a + b.widthMm * b.heightMm;
          }, 0);
          return used / (s.printableMm.widthMm * s.printableMm.heightMm);
        });
        row = `${String(layout.sheets.length).padStart(6)}  ${String(tiled.size).padStart(12)}  ${(Math.min(...fills) * 100).toFixed(0).padStart(13)} %`;
      } catch (error) {
        row = `  refused: ${(error as Error).message.slice(0, 60)}`;
      }
      console.log(`${m.id.padEnd(14)} 1:${String(n).padEnd(4)} ${paper.padEnd(7)}${row}`);
    }
