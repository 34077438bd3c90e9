/**
 * The home page's worked example against the engine: the text is the scale solver's own answer, and the
 * sheet count it states is the number of sheets the kit pipeline really lays out and draws for the same inputs
 * (one SVG document per sheet). The example's model is the demo Skein probe (content/models/skein-probe.json):
 * a hexagonal body 2.4 m across the flats, which the home page's body sizes are computed from.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { ModelContentSchema } from '../../../src/lib/geometry/model-schema';
import { buildKit } from '../../../src/lib/kit/build-kit';
import { HOME_EXAMPLE, homeExampleText } from '../../../src/lib/kit/home-example';
import { KitRequestSchema } from '../../../src/lib/kit/kit-request';
import { solvePaperScale } from '../../../src/lib/layout/scale-solver';
import { sheetSize } from '../../../src/lib/layout/sheet-sizes';
import { fixtureFonts } from '../../fixtures/pieces/kit-layout';

const content = ModelContentSchema.parse(
  JSON.parse(
    readFileSync(
      fileURLToPath(new URL(`../../../content/models/${HOME_EXAMPLE.modelId}.json`, import.meta.url)),
      'utf8',
    ),
  ),
);

describe('homeExampleText', () => {
  it("is the scale solver's answer for the example's model, scale and paper", () => {
    const { scaleDenominator, sheetSizeId, paperGsm } = HOME_EXAMPLE;
    const solved = solvePaperScale(content.model, { sheetId: sheetSizeId, paperGsm, scaleDenominator });
    expect(homeExampleText(content.model)).toBe(solved.explanation);
    expect(homeExampleText(content.model)).toMatch(new RegExp(`^1:${scaleDenominator} on `));
  });

  it('states as many sheets as the kit pipeline prints for the same inputs', async () => {
    const { scaleDenominator, sheetSizeId, paperGsm } = HOME_EXAMPLE;
    const kit = await buildKit(
      KitRequestSchema.parse({
        model: content.model,
        scaleDenominator,
        sheetSizeId,
        paperGsm,
        copies: 1,
        units: 'metric',
        qrUrl: 'https://kits.example.org/kits/home-example',
      }),
      fixtureFonts(),
      { outputs: ['svg'] },
    );
    const drawn = kit.svgSheets!.filter((svg) => svg.includes('<svg')).length;
    expect(drawn).toBe(kit.layout.sheets.length);
    const label = sheetSize(sheetSizeId).label;
    const stated = homeExampleText(content.model).match(new RegExp(`on (one|\\d+) ${label} sheets?`));
    expect(stated, homeExampleText(content.model)).not.toBeNull();
    expect(stated![1] === 'one' ? 1 : Number(stated![1])).toBe(drawn);
  });

  it("uses the scenario's probe: 2.4 m across the flats of a hexagonal body", () => {
    expect(content.model.body).toMatchObject({ kind: 'prism', sides: 6, across: 'flats', sizeM: 2.4 });
  });
});
