import { describe, expect, test } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { ModelContentSchema, ModelSchema } from '../../../src/lib/geometry/model-schema';
import { DEMO_IDS, MODELS_DIR } from './fixtures';

const base = { schemaVersion: 1, name: 'Test', appendages: [] };
const messages = (input: unknown) => {
  const r = ModelSchema.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => i.message);
};

describe('ModelSchema', () => {
  test('accepts every model content file', () => {
    expect(DEMO_IDS.length).toBeGreaterThanOrEqual(3);
    for (const id of DEMO_IDS) {
      const r = ModelContentSchema.safeParse(JSON.parse(readFileSync(join(MODELS_DIR, `${id}.json`), 'utf8')));
      expect(r.success, `${id}: ${r.success ? '' : r.error.issues.map((i) => i.message).join('; ')}`).toBe(true);
    }
  });

  test('rejects prism side counts outside 3 to 24 with a readable message', () => {
    expect(messages({ ...base, body: { kind: 'prism', sides: 2, across: 'flats', sizeM: 1, heightM: 1 } })).toContain(
      'a prism needs at least 3 sides',
    );
    expect(messages({ ...base, body: { kind: 'prism', sides: 25, across: 'flats', sizeM: 1, heightM: 1 } })).toContain(
      'a prism has at most 24 sides; use a cylinder for more',
    );
  });

  test('rejects zero, negative and non-finite sizes by name', () => {
    for (const bad of [0, -1, Number.NaN, Number.POSITIVE_INFINITY]) {
      const m = messages({ ...base, body: { kind: 'cylinder', diameterM: bad, heightM: 1, facets: 24 } });
      expect(m.length).toBeGreaterThan(0);
      expect(m.join(' ')).toMatch(/cylinder diameter/);
    }
  });

  test('rejects cylinder facet counts outside 6 to 256', () => {
    expect(messages({ ...base, body: { kind: 'cylinder', diameterM: 1, heightM: 1, facets: 5 } })).toContain(
      'a cylinder needs at least 6 facets',
    );
    expect(messages({ ...base, body: { kind: 'cylinder', diameterM: 1, heightM: 1, facets: 257 } })).toContain(
      'a cylinder has at most 256 facets',
    );
  });

  test('asks for either a small-satellite size or three box dimensions', () => {
    expect(
      messages({ ...base, body: { kind: 'box', smallsat: '3U', widthM: 1, depthM: 1, heightM: 1 } }).join(' '),
    ).toMatch(/either a smallsat size/);
    expect(messages({ ...base, body: { kind: 'box', widthM: 1 } }).join(' ')).toMatch(/either a smallsat size/);
    expect(messages({ ...base, body: { kind: 'box', smallsat: '3U' } })).toEqual([]);
  });

  test('rejects faces the body does not have, positions off the face and repeated ids', () => {
    const body = { kind: 'prism', sides: 6, across: 'flats', sizeM: 2.4, heightM: 0.9 };
    const boom = { kind: 'wire-boom', id: 'w', label: 'W', lengthM: 10 };
    expect(messages({ ...base, body, appendages: [{ ...boom, face: 'side:6' }] }).join(' ')).toMatch(
      /side:0 to side:5/,
    );
    expect(
      messages({ ...base, body, appendages: [{ ...boom, face: 'side:0', position: { uM: 2, vM: 0 } }] }).join(' '),
    ).toMatch(/must lie on side:0/);
    expect(
      messages({
        ...base,
        body,
        appendages: [
          { ...boom, face: 'top' },
          { ...boom, face: 'bottom' },
        ],
      }),
    ).toContain('id "w" is used twice');
  });

  test('rejects a dish whose inner diameter is not smaller than its diameter', () => {
    const body = { kind: 'box', smallsat: '1U' };
    const dish = {
      kind: 'dish',
      id: 'd',
      label: 'D',
      face: 'top',
      diameterM: 0.05,
      depthM: 0.01,
      innerDiameterM: 0.05,
    };
    expect(messages({ ...base, body, appendages: [dish] }).join(' ')).toMatch(/inner diameter .* must be smaller/);
  });

  test('rejects a schema version it does not know', () => {
    expect(messages({ ...base, schemaVersion: 2, body: { kind: 'box', smallsat: '1U' } })).toContain(
      'schemaVersion must be 1',
    );
  });
});

describe('ModelSchema bounds stop the work before it starts', () => {
  const twin = { kind: 'wire-boom', id: 'a', label: 'A', face: 'top', lengthM: 1 };
  test('a facet count above the bound is the only issue: the per-face checks never ran', () => {
    // Before: the refinement walked 1000 faces and also reported the duplicate id.
    const m = messages({
      ...base,
      body: { kind: 'cylinder', diameterM: 1, heightM: 1, facets: 1000 },
      appendages: [twin, twin],
    });
    expect(m).toEqual(['a cylinder has at most 256 facets']);
  });

  test('facets: 1e308 (a whole number zod accepts as int) answers the bound instead of looping', () => {
    expect(messages({ ...base, body: { kind: 'cylinder', diameterM: 1, heightM: 1, facets: 1e308 } })).toEqual([
      'a cylinder has at most 256 facets',
    ]);
  });
});
