/**
 * Change detector for ENGINE_VERSION (src/lib/kit/engine-version.ts): every demo model is built at the kit
 * builder's default settings on Letter and A4, and its PDF, SVG, STL and JSON files are hashed against
 * engine-output-hashes.json, recorded for one engine version. Files that change while ENGINE_VERSION stays the
 * same fail here, so one version never labels two outputs (a cached or saved kit is rebuilt when it changes).
 * This proves no geometry right (the other tests check it against the world); it only notices change.
 *
 * After bumping ENGINE_VERSION, re-record:
 *   KW_RECORD_ENGINE_HASHES=1 npx vitest run tests/lib/kit/engine-output.test.ts
 * prints the new table (each scale chosen by the scale solver as the builder chooses it); paste it over
 * engine-output-hashes.json. It refuses to print while a kit's files changed under a version that has a row.
 */
import { createHash } from 'node:crypto';
import { afterAll, describe, expect, test } from 'vitest';
import { buildKit, type KitBuild } from '../../../src/lib/kit/build-kit';
import { contentHashCanonicalJson } from '../../../src/lib/kit/content-hash';
import { demoModelResolve, demoModels } from '../../../src/lib/kit/demo-models.server';
import { ENGINE_VERSION } from '../../../src/lib/kit/engine-version';
import { PAPER_GSM_DEFAULT } from '../../../src/lib/geometry/paper';
import { KitInputsSchema, kitRequestOf, kitVenue } from '../../../src/lib/kit/kit-inputs';
import { INSTRUCTIONS_PLACE_DEFAULT } from '../../../src/lib/kit/kit-settings';
import type { KitRequest } from '../../../src/lib/kit/kit-request';
import { BUILD_GRADE_BAND_DEFAULT } from '../../../src/lib/geometry/buildability';
import { PRINT_CHOICE_DEFAULT } from '../../../src/lib/layout/print-plate';
import { solveKitScale } from '../../../src/lib/layout/scale-solver';
import { fixtureFonts } from '../../fixtures/pieces/kit-layout';
import recorded from './engine-output-hashes.json';

/** Digests of one kit's request and files (first 16 hex digits of SHA-256). */
interface KitDigests {
  scaleDenominator: number;
  request: string;
  pdf: string;
  svg: string;
  stl: string;
  json: string;
}
type FileName = 'pdf' | 'svg' | 'stl' | 'json';
const FILES: FileName[] = ['pdf', 'svg', 'stl', 'json'];

const TABLE: Record<string, Record<string, KitDigests>> = recorded;
const RECORDING = process.env.KW_RECORD_ENGINE_HASHES === '1';
const RE_RECORD = 'KW_RECORD_ENGINE_HASHES=1 npx vitest run tests/lib/kit/engine-output.test.ts';
const SHEET_IDS = ['letter', 'a4'] as const;
// A saved kit's page, so the first sheet carries a QR code as saved kits do (no real site).
const QR_URL = 'https://kitwright.example/kits/demo';

const fonts = fixtureFonts();
const row = TABLE[ENGINE_VERSION];
const built: Record<string, KitDigests> = {};

const digest = (bytes: string | Uint8Array) => createHash('sha256').update(bytes).digest('hex').slice(0, 16);

/**
 * The PDF with its clock and random parts blanked: jsPDF writes the creation time (with the machine's time
 * zone) and a random file /ID; everything else it writes is a function of the kit.
 */
function pdfWithoutClock(pdf: Uint8Array): string {
  const text = Buffer.from(pdf).toString('latin1');
  const blanks: [RegExp, string][] = [
    [/\/CreationDate \(D:[^)]*\)/g, '/CreationDate ()'],
    [/\/ID \[ *<[0-9A-F]+> *<[0-9A-F]+> *\]/g, '/ID []'],
  ];
  return blanks.reduce((out, [pattern, blank]) => {
    const found = out.match(pattern)?.length ?? 0;
    // A jsPDF that writes these differently would make the hash change on every run: say so instead.
    if (found !== 1) throw new Error(`expected one ${pattern} in the kit PDF, found ${found}`);
    return out.replace(pattern, blank);
  }, text);
}

/** The kit request the builder makes for a demo model on a sheet at its defaults and this scale. */
function builderRequest(modelId: string, sheetSizeId: (typeof SHEET_IDS)[number], scaleDenominator?: number) {
  const inputs = KitInputsSchema.parse({
    modelId,
    sheetSizeId,
    paperGsm: PAPER_GSM_DEFAULT,
    units: 'metric',
    venue: { kind: 'preset', id: 'classroom' },
    gradeBand: BUILD_GRADE_BAND_DEFAULT,
    scaleDenominator: scaleDenominator ?? 1,
    copies: 1,
    print: PRINT_CHOICE_DEFAULT,
    instructionsAt: INSTRUCTIONS_PLACE_DEFAULT,
  });
  const resolved = demoModelResolve(inputs);
  if (scaleDenominator === undefined) {
    // The builder's first scale: the solver's pick for paper and venue, else the paper model's scale.
    const solved = solveKitScale(
      resolved.model,
      {
        sheetId: sheetSizeId,
        paperGsm: inputs.paperGsm,
        ratios: 'usual',
        gradeBand: inputs.gradeBand,
        units: inputs.units,
      },
      kitVenue(inputs.venue),
      inputs.units,
    );
    inputs.scaleDenominator = solved.scaleDenominator ?? solved.paper.scaleDenominator;
  }
  return kitRequestOf(inputs, resolved, QR_URL);
}

function kitDigests(request: KitRequest, build: KitBuild): KitDigests {
  return {
    scaleDenominator: request.scaleDenominator,
    request: digest(contentHashCanonicalJson(request)),
    pdf: digest(pdfWithoutClock(build.pdf!)),
    svg: digest(build.svgSheets!.join('\n')),
    stl: digest(build.stl!),
    json: digest(build.json!),
  };
}

const CASES = demoModels().flatMap((m) => SHEET_IDS.map((sheet) => [`${m.id} ${sheet}`, m.id, sheet] as const));

describe(`demo kit files of engine ${ENGINE_VERSION}`, () => {
  test('the recorded table has a row for ENGINE_VERSION and one entry per demo kit', () => {
    expect(
      row && Object.keys(row).sort(),
      `No recorded files for engine ${ENGINE_VERSION} (or the demo kits changed): re-record with ${RE_RECORD}`,
    ).toEqual(CASES.map(([name]) => name).sort());
  });

  test('the same request builds the same files twice (the hashes are stable)', async () => {
    const request = builderRequest('wren-3u', 'a4', 5);
    const [a, b] = [await buildKit(request, fonts), await buildKit(request, fonts)];
    expect(kitDigests(request, a)).toEqual(kitDigests(request, b));
  });

  test.each(CASES)('%s builds the files recorded for this engine', async (name, modelId, sheet) => {
    const was = row?.[name];
    const request = builderRequest(modelId, sheet, RECORDING ? undefined : was?.scaleDenominator);
    const now = kitDigests(request, await buildKit(request, fonts));
    built[name] = now;
    if (!was) return; // the row test above fails and says how to record
    expect(now.request, `${name}: the demo model or the builder's defaults changed; re-record with ${RE_RECORD}`).toBe(
      was.request,
    );
    const changed = FILES.filter((f) => now[f] !== was[f]);
    expect(
      changed,
      `${name} at 1:${now.scaleDenominator}: the ${changed.join(', ')} changed but ENGINE_VERSION is still ` +
        `${ENGINE_VERSION}. Bump ENGINE_VERSION in src/lib/kit/engine-version.ts, then re-record with ${RE_RECORD}`,
    ).toEqual([]);
  });

  afterAll(() => {
    if (!RECORDING) return;
    const stale = Object.entries(built).filter(([name, now]) => {
      const was = row?.[name];
      return was && was.request === now.request && FILES.some((f) => now[f] !== was[f]);
    });
    if (stale.length > 0) {
      console.log(`Not recorded: files changed under engine ${ENGINE_VERSION}; bump ENGINE_VERSION first.`);
      return;
    }
    const sorted = Object.fromEntries(Object.entries(built).sort(([a], [b]) => a.localeCompare(b)));
    console.log(
      `Paste into tests/lib/kit/engine-output-hashes.json:\n${JSON.stringify({ [ENGINE_VERSION]: sorted }, null, 2)}`,
    );
  });
});
