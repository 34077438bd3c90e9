import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/lib/errors';
import {
  FOUR_POINT_SHAPE_REFUSE,
  FourPointInputSchema,
  formationQuality,
  fourPointGradient,
  reciprocalVectors,
} from '../../../src/lib/analysis/four-point';
import { SavedResultSchema } from '../../../src/lib/analysis/saved-result';
import { fourPointSavedResult } from '../../../src/lib/analysis/saved-result-tools';
import { fourPointSample } from '../../../src/lib/tools/four-point-sample';
import { seededRandom } from './seeded-random';

type V = [number, number, number];
const rng = seededRandom(1414);
const rand = (lo: number, hi: number) => lo + (hi - lo) * rng.uniform();
const randVec = (s: number): V => [rand(-s, s), rand(-s, s), rand(-s, s)];
const dot = (a: V, b: V) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const norm = (a: V) => Math.hypot(...a);
const input = (positions: V[], field: (p: V) => number) =>
  FourPointInputSchema.parse({ points: positions.map((p) => ({ positionCm: p, value: field(p) })), unit: '°C' });

/** A random rotation: a unit quaternion from three uniforms (Shoemake, Graphics Gems III, "Uniform random rotations"). */
function randomRotation(): (p: V) => V {
  const [u1, u2, u3] = [rng.uniform(), rng.uniform(), rng.uniform()];
  const [x, y, z, w] = [
    Math.sqrt(1 - u1) * Math.sin(2 * Math.PI * u2),
    Math.sqrt(1 - u1) * Math.cos(2 * Math.PI * u2),
    Math.sqrt(u1) * Math.sin(2 * Math.PI * u3),
    Math.sqrt(u1) * Math.cos(2 * Math.PI * u3),
  ];
  const m = [
    [1 - 2 * (y * y + z * z), 2 * (x * y - z * w), 2 * (x * z + y * w)],
    [2 * (x * y + z * w), 1 - 2 * (x * x + z * z), 2 * (y * z - x * w)],
    [2 * (x * z - y * w), 2 * (y * z + x * w), 1 - 2 * (x * x + y * y)],
  ];
  return (p) => m.map((row) => row[0]! * p[0] + row[1]! * p[1] + row[2]! * p[2]) as V;
}

/** Regular tetrahedron: alternate corners of a cube (any geometry handbook, e.g. CRC Standard Mathematical Tables). */
const REGULAR: V[] = [
  [10, 10, 10],
  [10, -10, -10],
  [-10, 10, -10],
  [-10, -10, 10],
];

describe('reciprocalVectors', () => {
  it('sum to zero and satisfy Σ k_α r_αᵀ = I (Chanteur, ISSI SR-001 ch. 14; from memory: eq. 14.8–14.9)', () => {
    for (let t = 0; t < 50; t++) {
      const pts = [randVec(50), randVec(50), randVec(50), randVec(50)] as [V, V, V, V];
      const k = reciprocalVectors(pts)!;
      for (let i = 0; i < 3; i++) {
        expect(Math.abs(k.reduce((s, v) => s + v[i]!, 0))).toBeLessThan(1e-12);
        for (let j = 0; j < 3; j++) {
          const sum = k.reduce((s, v, a) => s + v[i]! * pts[a]![j]!, 0);
          expect(sum).toBeCloseTo(i === j ? 1 : 0, 9);
        }
      }
    }
  });

  it('is null for four coplanar points', () => {
    expect(
      reciprocalVectors([
        [0, 0, 0],
        [1, 0, 0],
        [0, 1, 0],
        [1, 1, 0],
      ]),
    ).toBeNull();
  });
});

describe('fourPointGradient', () => {
  it('recovers the gradient of any linear field exactly for any non-degenerate tetrahedron (1e-9)', () => {
    // Exactness for linear fields is the defining property of the reciprocal-vector gradient
    // (Chanteur, ISSI SR-001 ch. 14): f = f0 + g·r is reproduced at all four points.
    let tested = 0;
    for (let t = 0; tested < 200 && t < 1000; t++) {
      const pts = [randVec(60), randVec(60), randVec(60), randVec(60)];
      if (formationQuality(pts).planarity > FOUR_POINT_SHAPE_REFUSE) continue;
      if (formationQuality(pts).elongation > FOUR_POINT_SHAPE_REFUSE) continue;
      const g = randVec(3);
      const f0 = rand(-20, 40);
      const r = fourPointGradient(input(pts, (p) => f0 + dot(g, p)));
      expect(r.method).toBe('reciprocal-vectors');
      expect(norm([r.gradientPerCm[0] - g[0], r.gradientPerCm[1] - g[1], r.gradientPerCm[2] - g[2]])).toBeLessThan(
        1e-9 * norm(g),
      );
      for (const res of r.residuals) expect(Math.abs(res)).toBeLessThan(1e-9 * Math.abs(f0) + 1e-9 * 60 * norm(g));
      tested++;
    }
    expect(tested).toBe(200);
  });

  it('is the same wherever the origin is and turns with the formation when it is rotated', () => {
    for (let t = 0; t < 50; t++) {
      const g = randVec(2);
      const pts = REGULAR.map((p) => [p[0] + rand(-3, 3), p[1] + rand(-3, 3), p[2] + rand(-3, 3)] as V);
      const field = (p: V) => 5 + dot(g, p) + 0.01 * p[0] * p[1]; // a slightly curved field
      const base = fourPointGradient(input(pts, field));
      const shift = randVec(500);
      const moved = fourPointGradient(
        input(
          pts.map((p) => [p[0] + shift[0], p[1] + shift[1], p[2] + shift[2]] as V),
          (p) => field([p[0] - shift[0], p[1] - shift[1], p[2] - shift[2]]),
        ),
      );
      for (let i = 0; i < 3; i++) expect(moved.gradientPerCm[i]).toBeCloseTo(base.gradientPerCm[i]!, 9);
      const rot = randomRotation();
      // The same readings at rotated positions: the gradient is the rotated gradient.
      const turned = fourPointGradient(
        FourPointInputSchema.parse({ points: pts.map((p) => ({ positionCm: rot(p), value: field(p) })) }),
      );
      const expected = rot(base.gradientPerCm);
      for (let i = 0; i < 3; i++) expect(turned.gradientPerCm[i]).toBeCloseTo(expected[i]!, 9);
      expect(turned.quality.elongation).toBeCloseTo(base.quality.elongation, 9);
      expect(turned.quality.planarity).toBeCloseTo(base.quality.planarity, 9);
    }
  });

  it('gives elongation and planarity 0 for a regular tetrahedron (Robert et al., ISSI SR-001 ch. 13)', () => {
    const q = fourPointGradient(input(REGULAR, (p) => p[2])).quality;
    expect(q.elongation).toBeCloseTo(0, 12);
    expect(q.planarity).toBeCloseTo(0, 12);
    expect(q.shape).toBe('good');
    // Each corner is 10√3 cm from the centre; R = (1/4)·Σ r rᵀ = 100·I cm² (hand calculation).
    for (const e of q.eigenvaluesCm2) expect(e).toBeCloseTo(100, 9);
  });

  it('reads semi-axes, elongation and planarity off an octahedral formation by hand', () => {
    // Points ±a x̂, ±b ŷ, ±c ẑ: R = diag(2a², 2b², 2c²)/6, so semi-axes a/√3, b/√3, c/√3 (hand calculation);
    // E = 1 − b/a, P = 1 − c/b (Robert et al., ISSI SR-001 ch. 13).
    const [a, b, c] = [40, 30, 6];
    const pts: V[] = [
      [a, 0, 0],
      [-a, 0, 0],
      [0, b, 0],
      [0, -b, 0],
      [0, 0, c],
      [0, 0, -c],
    ];
    const r = fourPointGradient(input(pts, (p) => 3 - 0.2 * p[0] + 0.5 * p[2]));
    expect(r.method).toBe('least-squares');
    expect(r.quality.semiAxesCm[0]).toBeCloseTo(a / Math.sqrt(3), 9);
    expect(r.quality.semiAxesCm[2]).toBeCloseTo(c / Math.sqrt(3), 9);
    expect(r.quality.elongation).toBeCloseTo(1 - b / a, 9);
    expect(r.quality.planarity).toBeCloseTo(1 - c / b, 9);
    expect(Math.abs(r.quality.axes[2][2])).toBeCloseTo(1, 9);
    expect(r.gradientPerCm[0]).toBeCloseTo(-0.2, 12);
    expect(r.gradientPerCm[1]).toBeCloseTo(0, 12);
    expect(r.gradientPerCm[2]).toBeCloseTo(0.5, 12);
    expect(r.residualRms).toBeLessThan(1e-12);
    expect(r.warnings.join(' ')).toMatch(/rather flat/);
  });

  it('fits the least-squares plane of noisy readings from many points (ordinary least squares by hand)', () => {
    // Points on a cube's corners: the design is orthogonal, so the LS slope along x is
    // Σ x·f / Σ x² (any regression text, e.g. Draper & Smith, Applied Regression Analysis, ch. 5).
    const pts: V[] = [];
    for (const x of [-10, 10]) for (const y of [-10, 10]) for (const z of [-10, 10]) pts.push([x, y, z]);
    const noise = pts.map(() => rng.normal());
    const r = fourPointGradient(
      FourPointInputSchema.parse({ points: pts.map((p, i) => ({ positionCm: p, value: 2 * p[1] + noise[i]! })) }),
    );
    for (let k = 0; k < 3; k++) {
      const slope =
        pts.reduce((s, p, i) => s + p[k]! * (2 * p[1] + noise[i]!), 0) / pts.reduce((s, p) => s + p[k]! ** 2, 0);
      expect(r.gradientPerCm[k]).toBeCloseTo(slope, 12);
    }
  });

  it('refuses four points in one plane, and the nearly flat, with the lesson of three points', () => {
    const square: V[] = [
      [0, 0, 0],
      [30, 0, 0],
      [30, 30, 0],
      [0, 30, 0],
    ];
    expect(() => fourPointGradient(input(square, (p) => p[2]))).toThrow(InputError);
    expect(() => fourPointGradient(input(square, (p) => p[2]))).toThrow(/one plane.*across that plane/);
    const almost: V[] = [...square.slice(0, 3), [0, 30, 0.5]];
    expect(() => fourPointGradient(input(almost, (p) => p[2]))).toThrow(/planarity 0\.9/);
    // One corner raised by 20 cm: solid enough, with or without a warning.
    const raised: V[] = [...square.slice(0, 3), [0, 30, 20]];
    expect(fourPointGradient(input(raised, (p) => p[2])).gradientPerCm[2]).toBeCloseTo(1, 12);
  });

  it('refuses points on a line, two sensors at one place and fewer than four points', () => {
    const line: V[] = [0, 1, 2, 3].map((i) => [i * 10, i * 10 + 0.01 * (i % 2), 0]);
    expect(() => fourPointGradient(input(line, (p) => p[0]))).toThrow(/one line/);
    const twin: V[] = [REGULAR[0]!, REGULAR[1]!, REGULAR[2]!, REGULAR[3]!, REGULAR[1]!];
    expect(() => fourPointGradient(input(twin, (p) => p[0]))).toThrow(/point 2 and point 5 are at the same position/);
    const three = FourPointInputSchema.safeParse({
      points: REGULAR.slice(0, 3).map((p) => ({ positionCm: p, value: 1 })),
    });
    expect(three.success).toBe(false);
    expect(JSON.stringify(three.error)).toMatch(/three points always lie in one plane/);
    expect(
      FourPointInputSchema.safeParse({ points: REGULAR.map((p) => ({ positionCm: p, value: Number.NaN })) }).success,
    ).toBe(false);
    // 1e300 squared overflows an IEEE 754 double (max ≈ 1.8e308): readings and positions are bounded first.
    expect(
      FourPointInputSchema.safeParse({ points: REGULAR.map((p) => ({ positionCm: p, value: 1e300 })) }).success,
    ).toBe(false);
    expect(
      FourPointInputSchema.safeParse({ points: REGULAR.map((p) => ({ positionCm: [p[0] * 1e300, 0, 0], value: 1 })) })
        .success,
    ).toBe(false);
  });

  it('saves the readings along the gradient in the shared saved-result shape', () => {
    const i = input(REGULAR, (p) => 2 * p[0] - p[2]);
    const saved = fourPointSavedResult(i, fourPointGradient(i));
    expect(SavedResultSchema.safeParse(saved).success).toBe(true);
    expect(saved.tool).toBe('four-point');
    // A linear field read along its own gradient is a straight line of slope |g| = √5 through every reading.
    const [readings, line] = saved.plot.series;
    const [[x0, y0], [x1, y1]] = line!.points as [[number, number], [number, number]];
    expect((y1 - y0) / (x1 - x0)).toBeCloseTo(Math.sqrt(5), 12);
    for (const [x, y] of readings!.points) expect(y).toBeCloseTo(y0 + Math.sqrt(5) * (x - x0), 9);
  });

  it('gives the sample a gradient pointing toward the lamp, and refuses the flat sample', () => {
    const r = fourPointGradient(FourPointInputSchema.parse({ points: fourPointSample('tetrahedron'), unit: '°C' }));
    expect(r.warnings).toEqual([]);
    // The sample lamp sits at x < 0 and above the table: warmer toward −x and +z.
    expect(r.gradientPerCm[0]).toBeLessThan(0);
    expect(r.gradientPerCm[2]).toBeGreaterThan(0);
    expect(() => fourPointGradient(FourPointInputSchema.parse({ points: fourPointSample('flat') }))).toThrow(
      /one plane/,
    );
  });
});

describe('formations with coordinates far below the formation size', () => {
  it('answers an InputError, not a crash inside the eigen-decomposition (a case the fuzz suite found)', () => {
    const input = FourPointInputSchema.parse({
      points: [
        { positionCm: [5.4e-323, 6.15e-96, -2.7e-24], value: 1e-18 },
        { positionCm: [-3.4e-304, 1.4e-302, 3.1e-209], value: 1e-40 },
        { positionCm: [3e-323, 4.1e-284, -1_000_000], value: -1e-149 },
        { positionCm: [-1.8e-302, -999_999, -1.5e-190], value: -8e-259 },
      ],
    });
    expect(() => fourPointGradient(input)).toThrow(InputError);
  });
});
