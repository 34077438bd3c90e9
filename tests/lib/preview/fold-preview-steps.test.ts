/**
 * Issue 10 item 4: the 3D preview walks the same steps as the kit's instructions. The preview's steps are
 * assemblySteps(props.pieces, props.rods) (FoldPreview.tsx); the PDF's are instructionsSteps(layout) of the
 * layout buildKit renders. Both are computed here from the same saved Skein kit at 1:20 on Letter, and the
 * island's server render is read for its step buttons.
 */
import { renderToString } from 'react-dom/server';
import { createElement } from 'react';
import { describe, expect, test } from 'vitest';
import FoldPreview from '../../../src/components/preview/FoldPreview';
import type { KitRow } from '../../../src/lib/db/kits';
import { buildKit } from '../../../src/lib/kit/build-kit';
import { KitInputsSchema } from '../../../src/lib/kit/kit-inputs';
import { kitPageData } from '../../../src/lib/kit/kit-page-data.server';
import { kitRequestForRow } from '../../../src/lib/kit/saved-kit.server';
import { assemblySteps } from '../../../src/lib/preview/assembly-steps';
import { instructionsSteps } from '../../../src/lib/render/instructions-page';
import { fixtureFonts } from '../../fixtures/pieces/kit-layout';

const inputs = KitInputsSchema.parse({
  modelId: 'skein-probe',
  sheetSizeId: 'letter',
  paperGsm: 160,
  units: 'us',
  venue: { kind: 'preset', id: 'classroom' },
  gradeBand: '6-8',
  scaleDenominator: 20,
  copies: 1,
});
const row: KitRow = {
  id: '00000000-0000-4000-8000-000000000010',
  class_id: '00000000-0000-4000-8000-000000000001',
  teacher_id: '00000000-0000-4000-8000-000000000002',
  title: 'Skein at 1:20',
  model_id: 'skein-probe',
  activity_slug: null,
  inputs: { ...inputs, qrUrl: 'https://kitwright.example/kits/skein' },
  engine_version: 'test',
  content_hash: 'test',
  sheet_count: 1,
  created_at: new Date(0),
  updated_at: new Date(0),
  class_name: 'Demo class',
  imported_model_title: null,
};

describe('the 3D preview of a saved kit', () => {
  test('walks the same steps as the PDF instructions of the Skein at 1:20, rod steps last', async () => {
    const { preview } = await kitPageData(row);
    const { layout } = await buildKit(await kitRequestForRow(row), fixtureFonts(), { outputs: ['pdf'] });
    const printed = instructionsSteps(layout);
    const shown = assemblySteps(preview.pieces, preview.rods);
    // The Skein's thin booms become skewers at 1:20 (part-substitutes.ts), so there are rod steps to walk.
    expect(preview.rods.length).toBeGreaterThan(0);
    expect(shown.length).toBe(printed.length);
    expect(shown.map((s) => s.description)).toEqual(printed.map((s) => s.description));
    const rodSteps = shown.slice(-preview.rods.length);
    expect(rodSteps.map((s) => s.rodPartId)).toEqual(preview.rods.map((r) => r.partId));
    expect(shown.slice(0, -preview.rods.length).every((s) => s.rodPartId === undefined)).toBe(true);

    // The island itself (server render, before WebGL is known): one step button per printed step, the last
    // ones naming the rods.
    const html = renderToString(createElement(FoldPreview, preview));
    const buttons = [...html.matchAll(/<li><button[^>]*>(.*?)<\/button><\/li>/g)].map((m) =>
      m[1]!.replace(/<!-- -->/g, ''),
    );
    expect(buttons.length).toBe(printed.length);
    expect(buttons.at(-1)).toContain(preview.rods.at(-1)!.label);
    expect(buttons.at(-1)).toMatch(new RegExp(`^${printed.length}\\. `));
  });
});
