/**
 * The four-point and launch-stack endpoints against the running test server: good data answers 200 with a
 * result and a saved result; flat formations, duplicate positions, NaN and bad masses answer a JSON 400 and
 * oversize bodies a 413, in the shared { error: { code, message, fields? } } shape.
 */
import { describe, expect, it } from 'vitest';
import { LAUNCH_STACK_SAMPLE } from '../../src/lib/tools/launch-stack-sample';

const BASE = process.env.KW_TEST_BASE_URL!;

interface Answer {
  status: number;
  // Response bodies are read loosely; each test checks the fields it needs.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  body: any;
}

async function post(path: string, body: string): Promise<Answer> {
  const res = await fetch(`${BASE}/api/analysis/${path}`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body,
    signal: AbortSignal.timeout(20_000),
  });
  expect(res.headers.get('content-type')).toMatch(/application\/json/);
  return { status: res.status, body: await res.json() };
}
const postJson = (path: string, data: unknown) => post(path, JSON.stringify(data));

// Regular tetrahedron on alternate cube corners (any geometry handbook).
const REGULAR = [
  [10, 10, 10],
  [10, -10, -10],
  [-10, 10, -10],
  [-10, -10, 10],
];
const points = (pos: number[][], f: (p: number[]) => number) => pos.map((p) => ({ positionCm: p, value: f(p) }));

describe('POST /api/analysis/four-point', () => {
  it('recovers a linear field exactly and rates the regular tetrahedron perfect', async () => {
    // Reciprocal vectors reproduce a linear field exactly (Chanteur, ISSI SR-001 ch. 14); E = P = 0 for a
    // regular tetrahedron (Robert et al., ISSI SR-001 ch. 13).
    const a = await postJson('four-point', {
      unit: '°C',
      points: points(REGULAR, (p) => 21 + 0.2 * p[0]! - 0.1 * p[2]!),
    });
    expect(a.status).toBe(200);
    expect(a.body.result.gradientPerCm[0]).toBeCloseTo(0.2, 12);
    expect(a.body.result.gradientPerCm[2]).toBeCloseTo(-0.1, 12);
    expect(a.body.result.quality.planarity).toBeCloseTo(0, 12);
    expect(a.body.savedResult.tool).toBe('four-point');
  });

  it('refuses a flat formation with the lesson of three points', async () => {
    const square = [
      [0, 0, 0],
      [30, 0, 0],
      [30, 30, 0],
      [0, 30, 0],
    ];
    const a = await postJson('four-point', { points: points(square, () => 1) });
    expect(a.status).toBe(400);
    expect(a.body.error.code).toBe('invalid_input');
    expect(a.body.error.message).toMatch(/almost in one plane \(planarity 1\), like three points do: they cannot see/);
  });

  it('refuses duplicate positions, NaN and too few points', async () => {
    const dup = await postJson('four-point', { points: points([...REGULAR, REGULAR[0]!], () => 1) });
    expect(dup.status).toBe(400);
    expect(dup.body.error.message).toMatch(/same position/);
    const nan = await post(
      'four-point',
      JSON.stringify({ points: points(REGULAR, () => 1) }).replace('"value":1', '"value":"NaN"'),
    );
    expect(nan.status).toBe(400);
    expect(nan.body.error.fields).toBeTruthy();
    const three = await postJson('four-point', { points: points(REGULAR.slice(0, 3), () => 1) });
    expect(three.status).toBe(400);
    expect(JSON.stringify(three.body.error)).toMatch(/three points always lie in one plane/);
  });

  it('answers 413 above the byte cap', async () => {
    const a = await postJson('four-point', { points: points(REGULAR, () => 1), unit: 'x'.repeat(60_000) });
    expect(a.status).toBe(413);
    expect(a.body.error.code).toBe('too_large');
  });
});

describe('POST /api/analysis/launch-stack', () => {
  const body = LAUNCH_STACK_SAMPLE;

  it('gives the stack height and centre of mass of a hand calculation', async () => {
    // Σ m·z / Σ m = 3610.5 kg·m / 1530 kg (worked by hand in tests/lib/analysis/launch-stack.test.ts).
    const a = await postJson('launch-stack', body);
    expect(a.status).toBe(200);
    expect(a.body.result.heightM).toBeCloseTo(4.1, 12);
    expect(a.body.result.centreOfMassM).toBeCloseTo(3610.5 / 1530, 12);
    expect(a.body.result.fits).toBe(true);
    expect(a.body.savedResult.tool).toBe('launch-stack');
  });

  it('refuses a negative mass, too many probes and an oversize body', async () => {
    const neg = await postJson('launch-stack', { ...body, probeMassKg: -5 });
    expect(neg.status).toBe(400);
    expect(neg.body.error.fields.probeMassKg).toBeTruthy();
    const many = await postJson('launch-stack', { ...body, stack: { ...body.stack, count: 99 } });
    expect(many.status).toBe(400);
    const big = await postJson('launch-stack', { ...body, padding: 'x'.repeat(20_000) });
    expect(big.status).toBe(413);
  });
});
