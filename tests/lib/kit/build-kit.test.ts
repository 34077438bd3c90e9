import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { PDFDocument } from 'pdf-lib';
import { instructionsPages } from '../../../src/lib/render/instructions-page';
import { textWidthMm } from '../../../src/lib/render/text-width';
import { describe, expect, test } from 'vitest';
import { InputError } from '../../../src/lib/errors';
import { buildKit } from '../../../src/lib/kit/build-kit';
import type { KitEngine, KitStage } from '../../../src/lib/kit/build-kit';
import { contentHash, contentHashCanonicalJson } from '../../../src/lib/kit/content-hash';
import { ENGINE_VERSION } from '../../../src/lib/kit/engine-version';
import { KitRequestSchema } from '../../../src/lib/kit/kit-request';
import { KIT_STAGE_LABELS, kitStagesOf } from '../../../src/lib/kit/kit-stages';
import { fixtureFonts } from '../../fixtures/pieces/kit-layout';
import { rectPiece, smallKitPieces } from '../../fixtures/pieces/pieces';

const fonts = fixtureFonts();
const skein = JSON.parse(
  readFileSync(fileURLToPath(new URL('../../../content/models/skein-probe.json', import.meta.url)), 'utf8'),
);
const request = (extra: Record<string, unknown> = {}) =>
  KitRequestSchema.parse({
    model: skein.model,
    scaleDenominator: 20,
    sheetSizeId: 'letter',
    paperGsm: 160,
    copies: 1,
    units: 'us',
    qrUrl: 'https://kitwright.example/kits/skein',
    ...extra,
  });
const fixtureEngine: KitEngine = {
  patterns: () => ({ pieces: [...smallKitPieces(), rectPiece('long', 400, 40)], threads: [], substitutes: [] }),
};

describe('buildKit', () => {
  test('packs full-size tiles of the Skein probe at 1:5 on Letter (tiles exactly as large as the free area)', async () => {
    const kit = await buildKit(request({ scaleDenominator: 5 }), fonts, { outputs: ['svg'] });
    const tiles = kit.layout.sheets.flatMap((s) => s.placements.filter((p) => p.tile));
    expect(tiles.length).toBeGreaterThan(0);
    for (const sheet of kit.layout.sheets) {
      for (const p of sheet.placements.filter((q) => q.tile)) {
        const w = p.tile!.windowMm;
        // Inside the printable area, to well under a micrometre.
        expect(w.xMm).toBeGreaterThanOrEqual(sheet.printableMm.xMm - 1e-6);
        expect(w.xMm + w.widthMm).toBeLessThanOrEqual(sheet.printableMm.xMm + sheet.printableMm.widthMm + 1e-6);
      }
    }
  });

  test('builds the Skein probe at 1:20 on Letter with the model engine: PDF pages = sheets + instructions = SVGs + instructions', async () => {
    const kit = await buildKit(request(), fonts);
    const pdf = await PDFDocument.load(kit.pdf!);
    const instructions = instructionsPages(kit.layout, kit.layout.sheetSize, textWidthMm);
    expect(instructions.length).toBeGreaterThan(0);
    expect(pdf.getPageCount()).toBe(kit.layout.sheets.length + instructions.length);
    expect(kit.svgSheets).toHaveLength(kit.layout.sheets.length);
    expect(kit.layout.pieces.length).toBeGreaterThan(0);
    // Binary STL: 84-byte header and count, then 50 bytes per triangle.
    expect((kit.stl!.length - 84) % 50).toBe(0);
    const json = JSON.parse(kit.json!);
    expect(json.contentHash).toBe(kit.contentHash);
    expect(json.pieces[0].hinge.faces.length).toBeGreaterThan(0);
    expect(json.sheets).toHaveLength(kit.layout.sheets.length);
  });

  test('reports the stages in order and stops when the signal aborts', async () => {
    const stages: KitStage[] = [];
    await buildKit(request(), fonts, { engine: fixtureEngine, onProgress: (s, f) => f === 1 && stages.push(s) });
    expect(stages).toEqual(['patterns', 'layout', 'pdf', 'svg', 'stl', 'json']);
    const controller = new AbortController();
    const run = buildKit(request(), fonts, {
      engine: fixtureEngine,
      signal: controller.signal,
      onProgress: (s) => s === 'layout' && controller.abort(new Error('cancelled by the teacher')),
    });
    await expect(run).rejects.toThrow('cancelled by the teacher');
  });

  test('makes only the outputs asked for', async () => {
    const kit = await buildKit(request(), fonts, { engine: fixtureEngine, outputs: ['svg'] });
    expect(kit.pdf).toBeUndefined();
    expect(kit.svgSheets!.length).toBe(kit.layout.sheets.length);
  });

  test('adds a cut list for sheet stock and none for paper', async () => {
    const stock = await buildKit(
      request({ sheetSizeId: 'panel-1220x2440', scaleDenominator: 1, units: 'metric' }),
      fonts,
      { engine: fixtureEngine, outputs: ['json'] },
    );
    expect(stock.layout.cutList.length).toBe(7);
    const paper = await buildKit(request(), fonts, { engine: fixtureEngine, outputs: [] });
    expect(paper.layout.cutList).toEqual([]);
  });

  test('refuses a kit of more than 200 sheets with an InputError that suggests fewer copies', async () => {
    // Six sheet-filling pieces × 40 copies = 240 sheets; 33 copies (198 sheets) would fit.
    const big: KitEngine = {
      ...fixtureEngine,
      patterns: () => ({
        pieces: Array.from({ length: 6 }, (_, i) => rectPiece(`d${i}`, 190, 190)),
        threads: [],
        substitutes: [],
      }),
    };
    const run = buildKit(request({ copies: 40 }), fonts, { engine: big });
    await expect(run).rejects.toThrow(InputError);
    await expect(buildKit(request({ copies: 40 }), fonts, { engine: big })).rejects.toThrow(/at most 33 copies/);
  });
});

describe('contentHash', () => {
  test('equals Node crypto SHA-256 of the canonical JSON (FIPS 180-4 reference implementation)', async () => {
    const input = { b: 2, a: [1, { d: 'x', c: null }] };
    const expected = createHash('sha256')
      .update(`{"engineVersion":"${ENGINE_VERSION}","input":{"a":[1,{"c":null,"d":"x"}],"b":2}}`)
      .digest('hex');
    expect(await contentHash(input)).toBe(expected);
  });

  test('gives the known SHA-256 of the empty-object input at engine version "" (checked with sha256sum)', async () => {
    // printf '{"engineVersion":"","input":{}}' | sha256sum
    expect(contentHashCanonicalJson({ engineVersion: '', input: {} })).toBe('{"engineVersion":"","input":{}}');
    expect(await contentHash({}, '')).toBe(
      createHash('sha256').update('{"engineVersion":"","input":{}}').digest('hex'),
    );
  });

  test('does not depend on key order but does on the engine version', async () => {
    expect(await contentHash({ x: 1, y: 2 })).toBe(await contentHash({ y: 2, x: 1 }));
    expect(await contentHash({ x: 1 }, '1.0.0')).not.toBe(await contentHash({ x: 1 }, '1.0.1'));
  });
});

describe('KitRequestSchema', () => {
  test('rejects zero, negative and non-finite scales and too many copies with readable messages', () => {
    for (const scaleDenominator of [0, -5, Number.POSITIVE_INFINITY, Number.NaN]) {
      expect(KitRequestSchema.safeParse({ ...request(), scaleDenominator }).success).toBe(false);
    }
    const r = KitRequestSchema.safeParse({ ...request(), copies: 41 });
    expect(r.success).toBe(false);
    expect(JSON.stringify(r.error?.issues)).toContain('copies must be at most 40');
  });
});

describe('kitStagesOf (the stages the builder shows while it waits)', () => {
  test.each(['svg', 'pdf', 'stl', 'json'] as const)('lists what a %s build reports, in its order', async (output) => {
    const reported: KitStage[] = [];
    await buildKit(request(), fonts, {
      engine: fixtureEngine,
      outputs: [output],
      onProgress: (stage, fraction) => fraction === 1 && reported.push(stage),
    });
    expect(kitStagesOf(output)).toEqual(reported);
    expect(reported.map((s) => KIT_STAGE_LABELS[s]).every(Boolean)).toBe(true);
  });
});
