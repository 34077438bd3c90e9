/**
 * The kit API against the running test server and the test database: previews and solver answers, 400s that
 * say what would work, saving only to one's own classes (404 otherwise), who sees which kit (a class session
 * only its class's kits), and downloads read back with reference libraries (pdf-lib for the PDF).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SKEIN_KIT_INPUTS } from '../fixtures/kit-settings';
import { PDFDocument } from 'pdf-lib';
import { kitPdfPageKinds, pdfPageTexts } from '../fixtures/pdf-text';
import type { Knex } from 'knex';
import { testKnex } from '../db/database';
import { api, postJson } from './harness';
import {
  accountCreate,
  classCreateDirect,
  classSessionCookie,
  userSessionCookie,
  type TestAccount,
} from './auth-helpers';

let knex: Knex;
let teacher: TestAccount;
let other: TestAccount;
let teacherCookie: string;
let otherCookie: string;
let coordinatorCookie: string;
let classA: string;
let classB: string;
let otherClass: string;

const INPUTS = SKEIN_KIT_INPUTS;

// Response bodies are read loosely; each test checks the fields it needs.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
async function body(res: Response): Promise<any> {
  return res.json();
}

const as = (cookie: string) => ({ cookie });
const send = (path: string, method: string, cookie: string, data?: unknown) =>
  api(path, {
    method,
    headers: { cookie, origin: process.env.KW_TEST_BASE_URL!, ...(data ? { 'content-type': 'application/json' } : {}) },
    ...(data ? { body: JSON.stringify(data) } : {}),
  });

async function kitSaved(cookie: string, classId: string, inputs: object = INPUTS) {
  const res = await postJson('/api/kits', { classId, inputs }, as(cookie));
  expect(res.status).toBe(201);
  return (await body(res)).kit;
}

beforeAll(async () => {
  knex = testKnex();
  teacher = await accountCreate(knex, { role: 'teacher', label: 'kits-teacher' });
  other = await accountCreate(knex, { role: 'teacher', label: 'kits-other' });
  const coordinator = await accountCreate(knex, { role: 'coordinator', label: 'kits-coord' });
  teacherCookie = await userSessionCookie(knex, teacher.id);
  otherCookie = await userSessionCookie(knex, other.id);
  coordinatorCookie = await userSessionCookie(knex, coordinator.id);
  classA = (await classCreateDirect(knex, teacher, 'Kits A')).id;
  classB = (await classCreateDirect(knex, teacher, 'Kits B')).id;
  otherClass = (await classCreateDirect(knex, other, 'Other kits')).id;
});

afterAll(async () => {
  await knex?.destroy();
});

describe('POST /api/kits/preview', () => {
  it('answers every sheet as SVG with a plain-words summary of the Skein at 1:20', async () => {
    const res = await postJson('/api/kits/preview', INPUTS, as(teacherCookie));
    expect(res.status).toBe(200);
    const data = await body(res);
    expect(data.sheetCount).toBe(data.sheets.length);
    expect(data.sheets[0]).toContain('<svg');
    // The Skein probe (content/models/skein-probe.json): 2.4 m / 20 = 12 cm across; 35 m / 20 = 1.75 m per wire boom.
    expect(data.summary.text).toContain('body 12 cm across the flats');
    expect(data.summary.text).toContain('each wire boom 1.75 m long');
    expect(data.summary.spanFitsVenue).toBe(true);
  });

  it('notes no shortfall for grades 6–8 at 1:20, only the skewers that stand in for the axial booms', async () => {
    const data = await body(await postJson('/api/kits/preview', { ...INPUTS, gradeBand: '6-8' }, as(teacherCookie)));
    expect(data.notes.bandWords).toBe('grades 6–8');
    expect(data.notes.shortPieces).toBe(0);
    expect(data.notes.sheets).toHaveLength(data.sheetCount);
    const notes = data.notes.sheets.flat();
    expect(notes.map((n: { kind: string }) => n.kind)).toEqual(['substitute', 'substitute']);
    // 6 m / 20 = 300 mm long and 0.1 m / 20 = 5 mm thick (content/models/skein-probe.json).
    expect(notes[0].words[0]).toBe(
      'A bamboo skewer cut to 300 mm (the paper tube would be 5.0 mm thick, thinner than a pencil)',
    );
  });

  it('notes the pieces too small for grades K–2 at 1:50 on the sheet that holds them, where they sit', async () => {
    const inputs = { ...INPUTS, scaleDenominator: 50, gradeBand: 'K-2' };
    const data = await body(await postJson('/api/kits/preview', inputs, as(teacherCookie)));
    expect(data.notes.shortPieces).toBeGreaterThan(0);
    const dish = data.notes.sheets[0].find((n: { pieceId: string }) => n.pieceId === 'dish');
    // 0.6 m / 50 = 12 mm across: under the 40 mm piece grades K–2 cut.
    expect(dish.words).toContain('The piece is 12 mm across; grades K–2 need 40 mm');
    expect(dish.at[0].x).toBeGreaterThan(0);
    expect(dish.at[0].x).toBeLessThan(1);
    expect(dish.at[0].y).toBeGreaterThan(0);
    expect(dish.at[0].y).toBeLessThan(1);
  });

  it('refuses a scale at which a piece is under the 5 mm floor, naming the ratio that works', async () => {
    const res = await postJson('/api/kits/preview', { ...INPUTS, scaleDenominator: 500 }, as(teacherCookie));
    expect(res.status).toBe(400);
    const data = await body(res);
    expect(data.error.code).toBe('invalid_input');
    expect(data.error.message).toMatch(
      /At 1:500 the .* would be \d+(\.\d)? mm across \(adults need 5\.0 mm\); 1:\d+ is the smallest ratio/,
    );
    expect(data.error.fields.scaleDenominator).toBeDefined();
  });

  it('refuses more than 200 sheets with the packer message', async () => {
    // Life size: 743 Letter sheets (1:2 needs 197 since long nets are cut at a fold instead of tiled).
    const res = await postJson('/api/kits/preview', { ...INPUTS, scaleDenominator: 1 }, as(teacherCookie));
    expect(res.status).toBe(400);
    expect((await body(res)).error.message).toMatch(/200 is the most a kit may have/);
  });

  it.each([
    ['zero scale', { scaleDenominator: 0 }, /scale must be 1:1 or smaller/],
    ['negative copies', { copies: -2 }, /copies must be at least 1/],
    ['non-finite paper weight', { paperGsm: '1e999' }, /paper weight/],
    ['unknown sheet', { sheetSizeId: 'b5' }, /sheet must be one of/],
    ['unknown demo model', { modelId: 'no-such-probe' }, /no demo model "no-such-probe"/],
  ])('answers 400 for %s with a message', async (_name, change, message) => {
    const res = await postJson('/api/kits/preview', { ...INPUTS, ...change }, as(teacherCookie));
    expect(res.status).toBe(400);
    expect((await body(res)).error.message).toMatch(message);
  });

  describe('streamed (Accept: application/x-ndjson)', () => {
    const streamed = (inputs: object) =>
      postJson('/api/kits/preview', inputs, { ...as(teacherCookie), accept: 'application/x-ndjson' });
    // eslint-disable-next-line @typescript-eslint/no-explicit-any
    const lines = async (res: Response): Promise<any[]> =>
      (await res.text())
        .split('\n')
        .filter(Boolean)
        .map((l) => JSON.parse(l));

    it('reports patterns, layout and sheets as each ends, then the same preview as the plain answer', async () => {
      // A scale no other test builds, so the server's cache cannot answer without building.
      const inputs = { ...INPUTS, scaleDenominator: 23 };
      const res = await streamed(inputs);
      expect(res.status).toBe(200);
      expect(res.headers.get('content-type')).toContain('application/x-ndjson');
      const got = await lines(res);
      expect(got.slice(0, 3).map((l) => [l.type, l.stage])).toEqual([
        ['stage', 'patterns'],
        ['stage', 'layout'],
        ['stage', 'svg'],
      ]);
      expect(got.slice(0, 3).every((l) => l.ms >= 0)).toBe(true);
      expect(got).toHaveLength(4);
      const plain = await body(await postJson('/api/kits/preview', inputs, as(teacherCookie)));
      expect(got[3].type).toBe('result');
      expect(got[3].data.contentHash).toBe(plain.contentHash);
      expect(got[3].data.sheetCount).toBe(plain.sheetCount);
    });

    it('refuses a scale too small to cut with a plain 400 before any stage', async () => {
      const res = await streamed({ ...INPUTS, scaleDenominator: 500 });
      expect(res.status).toBe(400);
      expect((await body(res)).error.fields.scaleDenominator).toBeDefined();
    });

    it('ends with an error line (status 400) when the layout needs more than 200 sheets', async () => {
      const got = await lines(await streamed({ ...INPUTS, scaleDenominator: 1 }));
      expect(got[0]).toMatchObject({ type: 'stage', stage: 'patterns' });
      const last = got[got.length - 1];
      expect(last).toMatchObject({ type: 'error', status: 400, error: { code: 'invalid_input' } });
      expect(last.error.message).toMatch(/200 is the most a kit may have/);
    });
  });

  it('asks anonymous callers to sign in', async () => {
    const res = await postJson('/api/kits/preview', INPUTS);
    expect(res.status).toBe(401);
  });
});

describe('POST /api/kits/preview-file', () => {
  it('answers the PDF of unsaved settings, one page per sheet and the instructions (read back with pdf.js)', async () => {
    const preview = await body(await postJson('/api/kits/preview', INPUTS, as(teacherCookie)));
    const res = await postJson('/api/kits/preview-file', { inputs: INPUTS, output: 'pdf' }, as(teacherCookie));
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    const pages = await kitPdfPageKinds(new Uint8Array(await res.arrayBuffer()));
    expect(pages.sheets).toBe(preview.sheetCount);
    expect(pages.instructions.length).toBeGreaterThan(0);
    expect(pages.instructions[0]).toMatch(/^How to build it/);
  });

  it('puts the instructions first when asked, headed with the model title the builder lists (pdf.js)', async () => {
    const inputs = { ...INPUTS, modelId: 'wren-3u', scaleDenominator: 5, instructionsAt: 'first' };
    const res = await postJson('/api/kits/preview-file', { inputs, output: 'pdf' }, as(teacherCookie));
    expect(res.status).toBe(200);
    const texts = await pdfPageTexts(new Uint8Array(await res.arrayBuffer()));
    expect(texts[0]).toMatch(/^How to build it: Wren 3U small satellite/);
    expect(texts.at(-1)).toMatch(/Sheet \d+ of \d+/);
    const last = await postJson(
      '/api/kits/preview-file',
      { inputs: { ...inputs, instructionsAt: 'last' }, output: 'pdf' },
      as(teacherCookie),
    );
    const lastTexts = await pdfPageTexts(new Uint8Array(await last.arrayBuffer()));
    expect(lastTexts[0]).toMatch(/Sheet 1 of \d+/);
    expect(lastTexts.at(-1)).not.toMatch(/Sheet \d+ of \d+/);
  });

  it('refuses a place for the instructions other than first or last, naming the field', async () => {
    const res = await postJson(
      '/api/kits/preview-file',
      { inputs: { ...INPUTS, instructionsAt: 'middle' }, output: 'pdf' },
      as(teacherCookie),
    );
    expect(res.status).toBe(400);
    const err = (await body(res)).error;
    expect(err.code).toBe('invalid_input');
    expect(Object.keys(err.fields ?? {}).join(' ')).toMatch(/instructionsAt/);
  });

  it('streams patterns, layout and PDF, then the same PDF base64 in the last line', async () => {
    const inputs = { ...INPUTS, scaleDenominator: 24 };
    const res = await postJson(
      '/api/kits/preview-file',
      { inputs, output: 'pdf' },
      { ...as(teacherCookie), accept: 'application/x-ndjson' },
    );
    const got = (await res.text())
      .split('\n')
      .filter(Boolean)
      .map((l) => JSON.parse(l));
    expect(got.map((l) => l.stage ?? l.type)).toEqual(['patterns', 'layout', 'pdf', 'result']);
    const file = got[3].data;
    expect(file.type).toBe('application/pdf');
    expect(file.name).toMatch(/^skein-probe-1-24-letter\.pdf$/);
    const pdf = await PDFDocument.load(Buffer.from(file.base64, 'base64'));
    const plain = await postJson('/api/kits/preview-file', { inputs, output: 'pdf' }, as(teacherCookie));
    expect(pdf.getPageCount()).toBe((await PDFDocument.load(new Uint8Array(await plain.arrayBuffer()))).getPageCount());
  });
});

describe('the print target of the STL', () => {
  it('builds the STL for a custom bed and says its scale in the preview; 400 with fields for a bad bed', async () => {
    const inputs = {
      ...INPUTS,
      print: { bed: { kind: 'custom', widthMm: 150, depthMm: 150, heightMm: 150 }, nozzleMm: 0.25 },
    };
    const preview = await body(await postJson('/api/kits/preview', inputs, as(teacherCookie)));
    expect(preview.print.bedLabel).toBe('Custom bed, 150 × 150 × 150 mm');
    expect(preview.print.explanation).toMatch(/2 × the 0\.25 mm nozzle/);
    const res = await postJson('/api/kits/preview-file', { inputs, output: 'stl' }, as(teacherCookie));
    expect(res.status).toBe(200);
    expect(res.headers.get('content-disposition')).toContain(`print-1-${preview.print.scaleDenominator}.stl`);
    const stl = new Uint8Array(await res.arrayBuffer());
    expect(stl.byteLength).toBe(84 + 50 * new DataView(stl.buffer).getUint32(80, true));
    const bad = await postJson(
      '/api/kits/preview',
      { ...INPUTS, print: { bed: { kind: 'custom', widthMm: 10, depthMm: 150, heightMm: 150 }, nozzleMm: 0.3 } },
      as(teacherCookie),
    );
    expect(bad.status).toBe(400);
    const fields = Object.keys((await body(bad)).error.fields);
    expect(fields).toEqual(expect.arrayContaining(['print.bed.widthMm', 'print.nozzleMm']));
  });
});

describe('POST /api/models/patterns', () => {
  it('answers 400 for a prism with too many sides and a zero size, listing both fields', async () => {
    const model = {
      schemaVersion: 1,
      name: 'Bad',
      body: { kind: 'prism', sides: 30, across: 'flats', sizeM: 0, heightM: 1 },
    };
    const res = await postJson(
      '/api/models/patterns',
      { model, scaleDenominator: 10, paperGsm: 160 },
      as(teacherCookie),
    );
    expect(res.status).toBe(400);
    const data = await body(res);
    expect(Object.keys(data.error.fields)).toEqual(expect.arrayContaining(['model.body.sides', 'model.body.sizeM']));
  });

  it('answers the pieces of a model sent in the request', async () => {
    const model = { schemaVersion: 1, name: 'Cube', body: { kind: 'box', widthM: 0.1, depthM: 0.1, heightM: 0.1 } };
    const res = await postJson(
      '/api/models/patterns',
      { model, scaleDenominator: 1, paperGsm: 160 },
      as(teacherCookie),
    );
    expect(res.status).toBe(200);
    const data = await body(res);
    // A cube's six 100 mm faces: 6 × 10 000 mm² (tabs counted apart).
    const area = data.pieces.reduce((s: number, p: { faceAreaMm2: number }) => s + p.faceAreaMm2, 0);
    expect(area).toBeCloseTo(60_000, 3);
  });
});

describe('POST /api/scale/solve', () => {
  it('suggests a scale with explanations for the Skein on Letter and a classroom', async () => {
    const res = await postJson(
      '/api/scale/solve',
      {
        modelId: 'skein-probe',
        sheetSizeId: 'letter',
        paperGsm: 160,
        units: 'metric',
        venue: { kind: 'preset', id: 'classroom' },
      },
      as(teacherCookie),
    );
    expect(res.status).toBe(200);
    const data = await body(res);
    expect(data.suggestedScaleDenominator).toBeGreaterThanOrEqual(1);
    expect(data.kit.explanation).toMatch(/1:\d+/);
    expect(data.kit.venue.explanation).toMatch(/classroom/);
  });

  it('answers 400 for a custom venue of zero length', async () => {
    const res = await postJson(
      '/api/scale/solve',
      {
        modelId: 'skein-probe',
        sheetSizeId: 'letter',
        paperGsm: 160,
        units: 'metric',
        venue: { kind: 'custom', lengthM: 0, widthM: 5 },
      },
      as(teacherCookie),
    );
    expect(res.status).toBe(400);
    expect((await body(res)).error.message).toMatch(/venue length must be more than 0 m/);
  });
});

describe('saved kits', () => {
  it('saves to the teacher’s own class and answers 404 for another teacher’s class', async () => {
    const kit = await kitSaved(teacherCookie, classA);
    expect(kit.classId).toBe(classA);
    expect(kit.links.svgSheets).toHaveLength(kit.sheetCount);
    const res = await postJson('/api/kits', { classId: otherClass, inputs: INPUTS }, as(teacherCookie));
    expect(res.status).toBe(404);
    expect((await body(res)).error.code).toBe('not_found');
  });

  it('hides a kit from another teacher (404) and shows it to a coordinator', async () => {
    const kit = await kitSaved(teacherCookie, classA);
    expect((await api(`/api/kits/${kit.id}`, { headers: as(otherCookie) })).status).toBe(404);
    expect((await api(`/api/kits/${kit.id}.pdf`, { headers: as(otherCookie) })).status).toBe(404);
    expect((await api(`/api/kits/${kit.id}`, { headers: as(coordinatorCookie) })).status).toBe(200);
    expect((await send(`/api/kits/${kit.id}`, 'PATCH', otherCookie, { title: 'Mine now' })).status).toBe(404);
    expect((await send(`/api/kits/${kit.id}`, 'DELETE', otherCookie)).status).toBe(404);
  });

  it('lets a class session open only its own class’s kits', async () => {
    const inA = await kitSaved(teacherCookie, classA);
    const inB = await kitSaved(teacherCookie, classB);
    const student = await classSessionCookie(knex, classA);
    expect((await api(`/api/kits/${inA.id}`, { headers: as(student) })).status).toBe(200);
    expect((await api(`/api/kits/${inB.id}`, { headers: as(student) })).status).toBe(404);
    const list = await body(await api('/api/kits', { headers: as(student) }));
    expect(list.kits.length).toBeGreaterThan(0);
    expect(list.kits.every((k: { classId: string }) => k.classId === classA)).toBe(true);
    expect((await send(`/api/kits/${inA.id}`, 'DELETE', student)).status).toBe(403);
  });

  it('serves a PDF with a page per sheet of the layout and the instructions, read back with pdf.js and pdf-lib', async () => {
    const kit = await kitSaved(teacherCookie, classA, { ...INPUTS, copies: 2 });
    const res = await api(`/api/kits/${kit.id}.pdf`, { headers: as(teacherCookie) });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    expect(res.headers.get('content-disposition')).toMatch(/attachment; filename=".+-1-20-letter\.pdf"/);
    const bytes = new Uint8Array(await res.arrayBuffer());
    const pages = await kitPdfPageKinds(bytes);
    expect(pages.sheets).toBe(kit.sheetCount);
    expect(pages.instructions.length).toBeGreaterThan(0);
    const pdf = await PDFDocument.load(bytes);
    expect(pdf.getPageCount()).toBe(kit.sheetCount + pages.instructions.length);
    // US Letter is 8.5 × 11 in = 612 × 792 pt (ASME Y14.1; 1 pt = 1/72 in, ISO 32000-1 §8.3.2.3).
    const { width, height } = pdf.getPage(0).getSize();
    expect([width, height].map((v) => Math.round(v))).toEqual([612, 792]);
  });

  it('serves one SVG per sheet, binary and ASCII STL and JSON, and 400 for a sheet out of range', async () => {
    const kit = await kitSaved(teacherCookie, classA);
    const svg = await api(`${kit.links.svgSheets[0]}`, { headers: as(teacherCookie) });
    expect(svg.status).toBe(200);
    expect(await svg.text()).toMatch(/<g id="cut"/);
    const bad = await api(`/api/kits/${kit.id}.svg?sheet=${kit.sheetCount + 1}`, { headers: as(teacherCookie) });
    expect(bad.status).toBe(400);
    expect((await body(bad)).error.message).toContain(`1 to ${kit.sheetCount}`);
    const stl = new Uint8Array(await (await api(kit.links.stl, { headers: as(teacherCookie) })).arrayBuffer());
    // Binary STL: 80-byte header, uint32 triangle count, 50 bytes per triangle.
    const triangles = new DataView(stl.buffer).getUint32(80, true);
    expect(stl.byteLength).toBe(84 + 50 * triangles);
    const ascii = await (await api(kit.links.stlAscii, { headers: as(teacherCookie) })).text();
    expect(ascii.match(/facet normal/g)?.length).toBe(triangles);
    const json = await body(await api(kit.links.json, { headers: as(teacherCookie) }));
    expect(json).toBeTypeOf('object');
  });

  it('renames, duplicates and deletes a kit for its teacher', async () => {
    const kit = await kitSaved(teacherCookie, classA);
    const renamed = await body(await send(`/api/kits/${kit.id}`, 'PATCH', teacherCookie, { title: 'Comet team kit' }));
    expect(renamed.kit.title).toBe('Comet team kit');
    expect(renamed.kit.contentHash).not.toBe(kit.contentHash);
    const empty = await send(`/api/kits/${kit.id}`, 'PATCH', teacherCookie, { title: '  ' });
    expect(empty.status).toBe(400);
    const copy = await send(`/api/kits/${kit.id}/duplicate`, 'POST', teacherCookie);
    expect(copy.status).toBe(201);
    const copied = (await body(copy)).kit;
    expect(copied.id).not.toBe(kit.id);
    expect(copied.title).toBe('Comet team kit (copy)');
    expect((await send(`/api/kits/${kit.id}/duplicate`, 'POST', teacherCookie, { classId: otherClass })).status).toBe(
      404,
    );
    expect((await send(`/api/kits/${kit.id}`, 'DELETE', teacherCookie)).status).toBe(200);
    expect((await api(`/api/kits/${kit.id}`, { headers: as(teacherCookie) })).status).toBe(404);
  });
});
