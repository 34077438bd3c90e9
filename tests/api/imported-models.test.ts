/**
 * Imported models against the running test server, its database and its storage folder: an STL or OBJ upload
 * is checked, kept and answered with what was found; the model is private to its owner until a coordinator
 * shares it; it builds kits through the same API as a demo model (importId), whose PDF passes `qpdf --check`
 * (Debian's qpdf, independent of jspdf) and whose pieces' area equals the mesh's (a cube of side a has area
 * 6a², textbook); unit and reduction stay fixed while kits use it, and deleting it removes its stored file.
 * Test meshes come from three.js (tests/lib/mesh/mesh-fixtures.ts), not from the importer.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Knex } from 'knex';
import polygonClipping, { type MultiPolygon, type Polygon } from 'polygon-clipping';
import * as THREE from 'three';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testKnex } from '../db/database';
import { geometrySoup, objBytes, stlBytes, type Soup } from '../lib/mesh/mesh-fixtures';
import {
  accountCreate,
  classCreateDirect,
  classSessionCookie,
  schoolIdByName,
  userSessionCookie,
} from './auth-helpers';
import { api, BASE_URL, postJson } from './harness';

const STORAGE_DIR = process.env.KW_STORAGE_DIR ?? '';
/** A 60 mm cube (three.js BoxGeometry: 12 triangles). */
const CUBE = geometrySoup(new THREE.BoxGeometry(60, 60, 60));
const CUBE_SIDE = 60;

let knex: Knex;
const cookie = {} as Record<'teacher' | 'otherTeacher' | 'coordinator' | 'classSession', string>;
let classId: string;

function upload(bytes: Uint8Array, fileName: string, as: string, field = 'file', title?: string): Promise<Response> {
  const form = new FormData();
  if (title !== undefined) form.append('title', title);
  form.append(field, new Blob([new Uint8Array(bytes)]), fileName);
  return api('/api/models/imports', { method: 'POST', body: form, headers: { origin: BASE_URL, cookie: as } });
}

function send(method: string, path: string, as: string, body?: unknown): Promise<Response> {
  return api(path, {
    method,
    headers: { origin: BASE_URL, cookie: as, ...(body === undefined ? {} : { 'content-type': 'application/json' }) },
    ...(body === undefined ? {} : { body: JSON.stringify(body) }),
  });
}

async function imported(soup: Soup, as = cookie.teacher, name = 'cube.stl') {
  const res = await upload(stlBytes(soup, true), name, as);
  expect(res.status, await res.clone().text()).toBe(201);
  return ((await res.json()) as { model: { id: string } & Record<string, unknown> }).model;
}

/** Area of a multipolygon by the shoelace formula: outer rings less their holes. */
function polygonsArea(mp: MultiPolygon): number {
  const ring = (r: [number, number][]) =>
    Math.abs(r.reduce((a, p, i) => a + p[0] * r[(i + 1) % r.length]![1] - r[(i + 1) % r.length]![0] * p[1], 0)) / 2;
  return mp.reduce((a, poly) => a + ring(poly[0]!) - poly.slice(1).reduce((h, r) => h + ring(r), 0), 0);
}

async function errorOf(res: Response): Promise<{ status: number; message: string }> {
  const body = (await res.json()) as { error: { message: string } };
  return { status: res.status, message: body.error.message };
}

beforeAll(async () => {
  expect(STORAGE_DIR, 'scripts/test.ts sets KW_STORAGE_DIR').not.toBe('');
  knex = testKnex();
  const school = await schoolIdByName(knex, 'Juniper Flats Middle School');
  const teacher = await accountCreate(knex, { role: 'teacher', label: 'imports-teacher', schoolId: school });
  const otherTeacher = await accountCreate(knex, { role: 'teacher', label: 'imports-other', schoolId: school });
  const coordinator = await accountCreate(knex, { role: 'coordinator', label: 'imports-coordinator' });
  classId = (await classCreateDirect(knex, teacher, 'Import class')).id;
  cookie.teacher = await userSessionCookie(knex, teacher.id);
  cookie.otherTeacher = await userSessionCookie(knex, otherTeacher.id);
  cookie.coordinator = await userSessionCookie(knex, coordinator.id);
  cookie.classSession = await classSessionCookie(knex, classId);
});

afterAll(async () => {
  await knex.destroy();
});

describe('importing a mesh file', () => {
  it('keeps a binary STL cube: six square faces, the unit guessed from its size, its real size in every unit', async () => {
    const model = await imported(CUBE);
    expect(model).toMatchObject({ title: 'cube', fileKind: 'stl', triangleCount: 12, faceCount: 6, unitGuess: 'cm' });
    expect(model.unit).toBe(model.unitGuess);
    // 60 file units: 0.6 m in centimetres, 0.06 m in millimetres, 1.524 m in inches (25.4 mm, exact by definition).
    const size = model.sizeByUnitM as Record<string, number[]>;
    expect(size.cm![0]).toBeCloseTo(0.6, 12);
    expect(size.mm![0]).toBeCloseTo(0.06, 12);
    expect(size.in![0]).toBeCloseTo(1.524, 12);
    const row = await knex('imported_models').where({ id: model.id }).first('storage_key');
    expect(existsSync(join(STORAGE_DIR, 'data', row.storage_key))).toBe(true);
  });

  it('reads an OBJ with its own title and says what it repaired (three.js writes every corner apart)', async () => {
    const form = objBytes(CUBE);
    const res = await upload(form, 'box.obj', cookie.teacher, 'file', 'Practice box');
    expect(res.status).toBe(201);
    const { model } = (await res.json()) as { model: { title: string; repairs: string[]; faceCount: number } };
    expect(model.title).toBe('Practice box');
    expect(model.faceCount).toBe(6);
    expect(model.repairs.join(' ')).toMatch(/merged/i);
  });

  it('refuses what it cannot fold or read, naming the problem, and stores nothing', async () => {
    const before = await knex('imported_models').count<{ n: string }[]>('* as n');
    // Three triangles on one edge: an edge shared by more than two faces (non-manifold).
    const fin: Soup = [
      [
        [0, 0, 0],
        [10, 0, 0],
        [0, 10, 0],
      ],
      [
        [10, 0, 0],
        [0, 0, 0],
        [0, -10, 0],
      ],
      [
        [0, 0, 0],
        [10, 0, 0],
        [0, 0, 10],
      ],
    ];
    const nonManifold = await errorOf(await upload(stlBytes(fin, false), 'fin.stl', cookie.teacher));
    expect(nonManifold.status).toBe(400);
    expect(nonManifold.message).toMatch(/edge/i);
    const empty = await errorOf(await upload(new Uint8Array(0), 'empty.stl', cookie.teacher));
    expect(empty).toEqual({ status: 400, message: expect.stringMatching(/empty|0 bytes/) });
    const kind = await errorOf(await upload(new TextEncoder().encode('hello'), 'notes.txt', cookie.teacher));
    expect(kind).toEqual({ status: 400, message: expect.stringMatching(/\.stl or \.obj/) });
    const field = await errorOf(await upload(stlBytes(CUBE, true), 'cube.stl', cookie.teacher, 'photo'));
    expect(field).toEqual({ status: 400, message: expect.stringMatching(/"file"/) });
    const notMultipart = await send('POST', '/api/models/imports', cookie.teacher, {});
    expect(notMultipart.status).toBe(400);
    const after = await knex('imported_models').count<{ n: string }[]>('* as n');
    expect(after[0]!.n).toBe(before[0]!.n);
  });

  it('answers 413 past 20 MB without reading the rest', async () => {
    const big = new Uint8Array(20_000_001);
    const res = await upload(big, 'huge.stl', cookie.teacher);
    expect(res.status).toBe(413);
  });
});

describe('who sees an imported model', () => {
  it('is its owner’s until a coordinator shares it; a class session then sees it too', async () => {
    const model = await imported(CUBE);
    const path = `/api/models/imports/${model.id}`;
    expect((await send('GET', path, cookie.otherTeacher)).status).toBe(404);
    expect((await send('GET', path, cookie.classSession)).status).toBe(404);
    const listed = async (as: string) =>
      ((await (await send('GET', '/api/models/imports', as)).json()) as { models: { id: string }[] }).models.some(
        (m) => m.id === model.id,
      );
    expect(await listed(cookie.otherTeacher)).toBe(false);
    expect(await listed(cookie.coordinator)).toBe(true);
    // Only staff share; the owner may rename.
    expect((await send('PATCH', path, cookie.teacher, { shared: true })).status).toBe(403);
    expect((await send('PATCH', path, cookie.otherTeacher, { title: 'Mine now' })).status).toBe(404);
    const shared = await send('PATCH', path, cookie.coordinator, { shared: true });
    expect(shared.status).toBe(200);
    expect(await listed(cookie.otherTeacher)).toBe(true);
    expect((await send('GET', path, cookie.classSession)).status).toBe(200);
    // Seeing a shared model is not owning it.
    expect((await send('DELETE', path, cookie.otherTeacher)).status).toBe(403);
    const audit = await knex('audit_events').where({ target_id: model.id, action: 'model.shared' }).first('id');
    expect(audit).toBeTruthy();
  });
});

describe('a kit from an imported model', () => {
  it('summarises the kit, previews it, saves it, and prints a PDF qpdf accepts with the cube’s whole area', async () => {
    const model = await imported(CUBE);
    // 60 units read as millimetres at 1:2: a 30 mm cube, whose net fits one Letter sheet.
    expect((await send('PATCH', `/api/models/imports/${model.id}`, cookie.teacher, { unit: 'mm' })).status).toBe(200);
    const summaryRes = await send('POST', `/api/models/imports/${model.id}/summary`, cookie.teacher, {
      scaleDenominator: 2,
      sheetSizeId: 'letter',
      paperGsm: 160,
    });
    expect(summaryRes.status).toBe(200);
    const { summary } = (await summaryRes.json()) as { summary: Record<string, number | boolean> };
    // A cube unfolds into one net of six faces: 5 folds, 7 glued edges (12 edges − 5 folds, Euler), one sheet.
    expect(summary).toMatchObject({ faceCount: 6, pieceCount: 1, sheetCount: 1, foldBackOk: true });
    expect((summary.tabCount as number) + (summary.tapedEdgeCount as number)).toBe(7);
    expect(summary.sizeMm).toBeCloseTo(CUBE_SIDE / 2, 9);

    const inputs = {
      importId: model.id,
      scaleDenominator: 2,
      sheetSizeId: 'letter',
      paperGsm: 160,
      units: 'metric',
      venue: { kind: 'preset', id: 'classroom' },
      copies: 1,
    };
    const patterns = await postJson('/api/models/patterns', { ...inputs }, { cookie: cookie.teacher });
    expect(patterns.status).toBe(200);
    const { pieces } = (await patterns.json()) as {
      pieces: { hinge: { faces: { polygonMm: [number, number][] }[] } }[];
    };
    expect(pieces).toHaveLength(1);
    // The faces laid flat, united by polygon-clipping (not the engine): no overlap, and the cube's area 6a².
    const faces = pieces[0]!.hinge.faces.map((f) => [f.polygonMm] as Polygon);
    const union = polygonClipping.union(faces[0]!, ...faces.slice(1));
    expect(polygonsArea(union)).toBeCloseTo(6 * (CUBE_SIDE / 2) ** 2, 6);

    // The scale solver reads the mesh as any model: the sheets it counts at its scale are the sheets a preview
    // at that scale lays out (the same unfold and packer, through another route).
    const { scaleDenominator: _n, copies: _c, ...solveInputs } = inputs;
    const solve = await postJson('/api/scale/solve', solveInputs, { cookie: cookie.teacher });
    expect(solve.status, await solve.clone().text()).toBe(200);
    const solved = (await solve.json()) as { kit: { paper: { scaleDenominator: number; sheetCount: number } } };
    const atSolved = await postJson(
      '/api/kits/preview',
      { ...inputs, scaleDenominator: solved.kit.paper.scaleDenominator },
      { cookie: cookie.teacher },
    );
    expect(((await atSolved.json()) as { sheetCount: number }).sheetCount).toBe(solved.kit.paper.sheetCount);

    const preview = await postJson('/api/kits/preview', inputs, { cookie: cookie.teacher });
    expect(preview.status, await preview.clone().text()).toBe(200);
    expect(((await preview.json()) as { sheetCount: number }).sheetCount).toBe(1);

    const saved = await postJson(
      '/api/kits',
      { classId, inputs: { ...inputs, title: 'Cube kit' } },
      { cookie: cookie.teacher },
    );
    expect(saved.status, await saved.clone().text()).toBe(201);
    const kitId = ((await saved.json()) as { kit: { id: string } }).kit.id;
    const kitRow = await knex('kits').where({ id: kitId }).first('model_id');
    expect(kitRow.model_id).toBe(`import:${model.id}`);

    const pdf = await api(`/api/kits/${kitId}.pdf`, { headers: { cookie: cookie.teacher } });
    expect(pdf.status).toBe(200);
    const dir = mkdtempSync(join(tmpdir(), 'kw-import-'));
    writeFileSync(join(dir, 'kit.pdf'), Buffer.from(await pdf.arrayBuffer()));
    expect(execFileSync('qpdf', ['--check', join(dir, 'kit.pdf')]).toString()).toMatch(
      /No syntax or stream encoding errors/,
    );

    // The kit's class session may open the kit page, whose 3D preview folds the cube's piece.
    const page = await api(`/kits/${kitId}`, { headers: { cookie: cookie.classSession } });
    expect(page.status).toBe(200);

    // While the kit exists the mesh stays as it is: unit, reduction and deletion answer 409.
    const unit = await errorOf(await send('PATCH', `/api/models/imports/${model.id}`, cookie.teacher, { unit: 'cm' }));
    expect(unit).toEqual({ status: 409, message: expect.stringMatching(/1 saved kit/) });
    expect((await send('DELETE', `/api/models/imports/${model.id}`, cookie.teacher)).status).toBe(409);
    expect(
      (await send('PATCH', `/api/models/imports/${model.id}`, cookie.teacher, { title: 'Still fine' })).status,
    ).toBe(200);

    // Once the kit is gone the model can go, and its stored file with it.
    expect((await send('DELETE', `/api/kits/${kitId}`, cookie.teacher)).status).toBe(200);
    const row = await knex('imported_models').where({ id: model.id }).first('storage_key');
    expect((await send('DELETE', `/api/models/imports/${model.id}`, cookie.teacher)).status).toBe(200);
    expect(existsSync(join(STORAGE_DIR, 'data', row.storage_key))).toBe(false);
    expect((await send('GET', `/api/models/imports/${model.id}`, cookie.teacher)).status).toBe(404);
  });

  it('refuses an importId the caller may not use, and a model sent with a mesh of its own', async () => {
    const model = await imported(CUBE);
    const inputs = { importId: model.id, scaleDenominator: 1, sheetSizeId: 'letter', paperGsm: 160 };
    const other = await errorOf(await postJson('/api/models/patterns', inputs, { cookie: cookie.otherTeacher }));
    expect(other).toEqual({ status: 400, message: expect.stringMatching(/no imported model/) });
    const both = await postJson(
      '/api/models/patterns',
      { ...inputs, modelId: 'skein-probe' },
      { cookie: cookie.teacher },
    );
    expect(both.status).toBe(400);
  });

  it('reduces a fine mesh to a target and back, and builds from the reduced one', async () => {
    const sphere = await imported(geometrySoup(new THREE.IcosahedronGeometry(40, 3)), cookie.teacher, 'ball.stl');
    expect(sphere.triangleCount).toBe(320);
    const path = `/api/models/imports/${sphere.id}`;
    const reduced = await send('PATCH', path, cookie.teacher, { reduceToTriangles: 80 });
    expect(reduced.status, await reduced.clone().text()).toBe(200);
    const view = ((await reduced.json()) as { model: { reducedTriangleCount: number; triangleCount: number } }).model;
    expect(view.reducedTriangleCount).toBeLessThanOrEqual(80);
    expect(view.triangleCount).toBe(320);
    const summary = async () =>
      (
        (await (
          await send('POST', `${path}/summary`, cookie.teacher, { scaleDenominator: 1, sheetSizeId: 'a4' })
        ).json()) as { summary: { faceCount: number } }
      ).summary;
    // Every icosphere triangle has a plane of its own (320 faces); the reduced mesh has at most its triangles.
    const reducedFaces = (await summary()).faceCount;
    expect(reducedFaces).toBeLessThanOrEqual(view.reducedTriangleCount);
    expect(reducedFaces).toBeGreaterThan(0);
    const tooFew = await send('PATCH', path, cookie.teacher, { reduceToTriangles: 2 });
    expect(tooFew.status).toBe(400);
    expect((await send('PATCH', path, cookie.teacher, { reduceToTriangles: null })).status).toBe(200);
    expect((await summary()).faceCount).toBe(320);
  });
});
