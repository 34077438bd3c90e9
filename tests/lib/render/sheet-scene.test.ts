import polygonClipping from 'polygon-clipping';
import { describe, expect, test } from 'vitest';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { sheetPack } from '../../../src/lib/layout/sheet-packer';
import { SHEET_SIZES } from '../../../src/lib/layout/sheet-sizes';
import type { KitLayout } from '../../../src/lib/layout/types';
import { LABEL_BOX_HEIGHT_EM, labelBox } from '../../../src/lib/render/label-placement';
import { sheetScene } from '../../../src/lib/render/sheet-scene';
import { QR_CAPTION, QR_PREVIEW_NOTE, sceneWrapWords } from '../../../src/lib/render/scene-footer';
import { sceneLabelAbbreviations } from '../../../src/lib/render/scene-piece-labels';
import { textWidthMm } from '../../../src/lib/render/text-width';
import { demoModel } from '../geometry/fixtures';
import { multiPolygonArea } from '../layout/polygon-area';

function kitOf(id: string, n: number): KitLayout {
  const { pieces, threads, substitutes } = modelPatterns(demoModel(id), { scaleDenominator: n, paperGsm: 160 });
  const sheetSize = SHEET_SIZES.letter;
  const sheets = sheetPack(pieces, { sheetSize, units: 'us', copies: 1 });
  return {
    title: id,
    scaleDenominator: n,
    sheetSize,
    units: 'us',
    pieces,
    sheets,
    threads,
    substitutes,
    gradeBand: '6-8',
    cutList: [],
    qrUrl: 'https://kitwright.example/k',
    engineVersion: 'test',
  };
}

describe('sheetScene', () => {
  test.each([
    ['skein-probe', 20],
    ['skein-probe', 50],
    ['thermal-puck', 5],
    ['wren-3u', 2],
  ] as const)('keeps every label box of the %s at 1:%i clear of every other (polygon-clipping)', (id, n) => {
    const kit = kitOf(id, n);
    for (const sheet of kit.sheets) {
      const boxes = sheetScene(kit, sheet)
        .texts.filter((t) => t.group === 'labels')
        .map((t) =>
          labelBox(
            t.atMm,
            t.angleRad,
            textWidthMm(t.text, t.sizeMm, t.bold),
            t.sizeMm * LABEL_BOX_HEIGHT_EM,
            t.anchor,
          ).map(([x, y]) => [x, y] as [number, number]),
        );
      for (let i = 0; i < boxes.length; i++)
        for (let j = i + 1; j < boxes.length; j++)
          // Reference library's intersection; 1e-6 mm² for slivers along touching sides.
          expect(
            multiPolygonArea(polygonClipping.intersection([boxes[i]!], [boxes[j]!])),
            `${id} sheet ${sheet.number}`,
          ).toBeLessThan(1e-6);
    }
  });

  test('shortens a name by leading words, keeping two', () => {
    expect(sceneLabelAbbreviations('Wire boom +X anchor')).toEqual([
      'Wire boom +X anchor',
      'boom +X anchor',
      '+X anchor',
    ]);
    expect(sceneLabelAbbreviations('Body')).toEqual(['Body']);
  });
});

describe('sheetScene furniture', () => {
  test('prints the QR code for a saved kit and, with no kit page, a wrapped note inside the QR square instead', () => {
    const saved = kitOf('skein-probe', 20);
    const unsaved = { ...saved, qrUrl: null };
    const first = saved.sheets[0]!;
    const furnitureRects = (k: KitLayout) =>
      sheetScene(k, first)
        .fills.filter((f) => f.group === 'furniture')
        .flatMap((f) => f.rects);
    expect(furnitureRects(saved).length).toBeGreaterThan(20);
    expect(furnitureRects(unsaved)).toEqual([]);
    const texts = sheetScene(unsaved, first).texts.map((t) => t.text);
    expect(texts).toContain(QR_PREVIEW_NOTE[0]);
    expect(texts).not.toContain(QR_CAPTION);
    expect(sheetScene(saved, first).texts.map((t) => t.text)).not.toContain(QR_PREVIEW_NOTE[0]);
  });

  test('wraps words to a width by the measure it is given', () => {
    const lines = sceneWrapWords(QR_PREVIEW_NOTE[1], 30, 2.4, textWidthMm);
    expect(lines.join(' ')).toBe(QR_PREVIEW_NOTE[1]);
    expect(lines.length).toBeGreaterThan(1);
    for (const l of lines) expect(textWidthMm(l, 2.4, false)).toBeLessThanOrEqual(30);
  });
});
