/**
 * The SVG sheets as a cutting machine takes them, read with tools outside the renderer: @xmldom/xmldom parses
 * each document (XML 1.0: any well-formedness error fails), ids are unique (XML 1.0 §3.3.1, validity constraint
 * "ID": an ID value must appear only once in a document), and the `cut` group's paths, flattened to absolute
 * points by svg-path-commander, form closed loops — every subpath end meets the start of a subpath, so the cut
 * layer alone frees every piece and every tile.
 */
import { DOMParser } from '@xmldom/xmldom';
import type { Element } from '@xmldom/xmldom';
import SVGPathCommander from 'svg-path-commander';
import { describe, expect, test } from 'vitest';
import { buildKit } from '../../../src/lib/kit/build-kit';
import { KitRequestSchema } from '../../../src/lib/kit/kit-request';
import { SHEET_SIZE_IDS } from '../../../src/lib/layout/sheet-sizes';
import { fixtureFonts } from '../../fixtures/pieces/kit-layout';
import { DEMO_IDS, demoModel } from '../geometry/fixtures';

/** Two path ends closer than this meet, mm: the SVG writes µm (3 decimals). */
const END_TOLERANCE_MM = 0.005;
const SCALES = [10, 20, 25, 50] as const;
const fonts = fixtureFonts();

/** A parsed document and its non-fatal errors; a document that is not well-formed throws. */
function svgDocument(svg: string) {
  const errors: string[] = [];
  const doc = new DOMParser({
    onError: (level, message) => {
      if (level !== 'warning') errors.push(message);
    },
  }).parseFromString(svg, 'image/svg+xml');
  return { doc, errors };
}

function elements(root: Element): Element[] {
  const out: Element[] = [];
  const walk = (e: Element) => {
    out.push(e);
    for (let c = e.firstChild; c; c = c.nextSibling) if (c.nodeType === 1) walk(c as Element);
  };
  walk(root);
  return out;
}

/** The ends of every open subpath of a path (a subpath that returns to its start, or ends in Z, has none). */
function openEnds(d: string): [number, number][] {
  const ends: [number, number][] = [];
  let start: [number, number] | null = null;
  let at: [number, number] = [0, 0];
  const finish = () => {
    if (start && Math.hypot(at[0] - start[0], at[1] - start[1]) > END_TOLERANCE_MM) ends.push(start, at);
  };
  for (const seg of SVGPathCommander.normalizePath(d)) {
    const cmd = seg[0];
    if (cmd === 'M') {
      finish();
      start = [Number(seg[1]), Number(seg[2])];
      at = start;
    } else if (cmd === 'Z') at = start!;
    else at = [Number(seg[seg.length - 2]), Number(seg[seg.length - 1])];
  }
  finish();
  return ends;
}

/** Ends left over after pairing each end with another within the tolerance (paths that join into a loop). */
function unmatchedEnds(ends: [number, number][]): number {
  const used = ends.map(() => false);
  let unmatched = 0;
  ends.forEach((a, i) => {
    if (used[i]) return;
    used[i] = true;
    const j = ends.findIndex((b, k) => !used[k] && Math.hypot(a[0] - b[0], a[1] - b[1]) <= END_TOLERANCE_MM);
    if (j < 0) unmatched++;
    else used[j] = true;
  });
  return unmatched;
}

describe('SVG sheets for cutting machines', () => {
  test('finds loose ends in a cut group that has them (the check can fail)', () => {
    expect(unmatchedEnds(openEnds('M0 0L10 0L10 10'))).toBe(2);
    expect(unmatchedEnds([...openEnds('M0 0L10 0'), ...openEnds('M10 0L0 0')])).toBe(0);
    expect(unmatchedEnds(openEnds('M0 0L10 0L10 10Z'))).toBe(0);
    expect(() => svgDocument('<svg><g id="a"></svg>')).toThrow(/mismatch/);
    expect(svgDocument('<svg><text>a &nbsp; b</text></svg>').errors.length).toBeGreaterThan(0);
  });

  for (const id of DEMO_IDS)
    for (const scaleDenominator of SCALES)
      test(`${id} at 1:${scaleDenominator}: every sheet of every size parses, has unique ids and a closed cut layer`, async () => {
        for (const sheetSizeId of SHEET_SIZE_IDS) {
          const request = KitRequestSchema.parse({ model: demoModel(id), scaleDenominator, sheetSizeId, qrUrl: null });
          const kit = await buildKit(request, fonts, { outputs: ['svg'] });
          expect(kit.svgSheets!.length).toBe(kit.layout.sheets.length);
          kit.svgSheets!.forEach((svg, i) => {
            const where = `${sheetSizeId} sheet ${i + 1}`;
            const { doc, errors } = svgDocument(svg);
            expect(errors, where).toEqual([]);
            const all = elements(doc.documentElement!);
            const ids = all.map((e) => e.getAttribute('id')).filter((v): v is string => Boolean(v));
            expect(ids.length - new Set(ids).size, `${where}: repeated ids`).toBe(0);
            // Every url(#…) reference names an element of the same document.
            for (const e of all) {
              const ref = /url\(#([^)]+)\)/.exec(e.getAttribute('clip-path') ?? '')?.[1];
              if (ref) expect(ids, where).toContain(ref);
            }
            const cut = all.find((e) => e.getAttribute('id') === 'cut')!;
            const children = elements(cut).slice(1);
            expect(children.every((e) => e.tagName === 'path')).toBe(true);
            const tiled = kit.layout.sheets[i]!.placements.filter((p) => p.tile).length;
            // Each placement gives at least one contour.
            expect(children.length, where).toBeGreaterThanOrEqual(kit.layout.sheets[i]!.placements.length);
            const ends = children.flatMap((p) => openEnds(p.getAttribute('d') ?? ''));
            expect(unmatchedEnds(ends), `${where}: loose cut ends (${tiled} tiles)`).toBe(0);
          });
        }
      });
});
