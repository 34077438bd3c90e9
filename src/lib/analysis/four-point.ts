/**
 * The four-point measurement tool: a field's gradient from readings taken at four (or more) places at once,
 * and how good the formation of sensors is for it.
 *
 * - Four points: the reciprocal vectors of the tetrahedron, k_α = (r_βγ × r_βλ) / (r_βα · (r_βγ × r_βλ))
 *   with (α, β, γ, λ) a permutation of the four points and r_ab = r_b − r_a; the gradient is Σ k_α·f_α,
 *   exact for a field that changes linearly in space (Chanteur, "Spatial Interpolation for Four Spacecraft:
 *   Theory", ch. 14 of Paschmann & Daly (eds.), Analysis Methods for Multi-Spacecraft Data, ISSI Scientific
 *   Report SR-001, 1998; from memory: ch. 14).
 * - More points: least squares, ∇f = R⁻¹·(1/N)·Σ (f_α − f̄)(r_α − r_b), with R the volumetric tensor
 *   (Harvey, "Spatial Gradients and the Volumetric Tensor", ch. 12 of the same report; from memory: ch. 12).
 * - Formation quality: R = (1/N)·Σ (r_α − r_b)(r_α − r_b)ᵀ about the mesocentre r_b; its eigenvalues give the
 *   semi-axes a ≥ b ≥ c of the formation's ellipsoid (square roots), elongation E = 1 − b/a and planarity
 *   P = 1 − c/b (Robert et al., "Tetrahedron Geometric Factors", ch. 13 of the same report; from memory:
 *   ch. 13). A regular tetrahedron has E = P = 0; a flat formation has P near 1 and sees nothing across it.
 */
import { EigenvalueDecomposition, Matrix, solve } from 'ml-matrix';
import { z } from 'zod';
import { InputError } from '../errors';
import { TextSchema } from '../text-schema';
import { readingBetween } from './reading-range';

/** Largest JSON four-point request, bytes. */
export const FOUR_POINT_JSON_MAX_BYTES = 50_000;
/** Fewest points: three always lie in one plane and cannot see the gradient across it. */
export const FOUR_POINT_MIN_POINTS = 4;
export const FOUR_POINT_MAX_POINTS = 100;
/**
 * Above these the formation is refused (too flat, too thin): the thinnest semi-axis is less than a tenth
 * of the next one. Between the warning and the refusal limits the tool answers with a warning; a square with
 * one corner raised by half its side (P ≈ 0.72, the classroom formation) gets none. Common practice, no
 * source: the ISSI report's ch. 13 discusses the E–P plane but sets no single limit.
 */
export const FOUR_POINT_SHAPE_REFUSE = 0.9;
export const FOUR_POINT_SHAPE_WARN = 0.75;
/** Farthest a sensor may be from the origin along any axis, cm (10 km: past any classroom or field). */
export const FOUR_POINT_POSITION_MAX_CM = 1e6;
/** Largest reading magnitude, in the reading's unit (the squares of the least squares stay finite). */
export const FOUR_POINT_READING_MAX = 1e9;
/** Two points closer than this fraction of the formation's size count as the same place. */
const SAME_PLACE_FRACTION = 1e-9;

type Vec3 = [number, number, number];
const position = readingBetween(-FOUR_POINT_POSITION_MAX_CM, FOUR_POINT_POSITION_MAX_CM, 'cm');

export const FourPointInputSchema = z
  .object({
    points: z
      .array(
        z
          .object({
            /** A sensor's name ("A", "thermometer 2"). */
            label: TextSchema.trim().max(40).optional(),
            /** Where the sensor is, cm (x, y, z). */
            positionCm: z.tuple([position, position, position]),
            /** What it reads there, in `unit`. */
            value: readingBetween(-FOUR_POINT_READING_MAX, FOUR_POINT_READING_MAX, 'in the unit of the readings'),
          })
          .strict(),
      )
      .min(
        FOUR_POINT_MIN_POINTS,
        `give at least ${FOUR_POINT_MIN_POINTS} points: three points always lie in one plane and cannot see how the field changes across it`,
      )
      .max(FOUR_POINT_MAX_POINTS, `at most ${FOUR_POINT_MAX_POINTS} points`),
    /** Unit of the readings ("°C", "µT"); the gradient is in this unit per cm. */
    unit: TextSchema.trim().max(12).default(''),
  })
  .strict();
export type FourPointInput = z.infer<typeof FourPointInputSchema>;

export interface FormationQuality {
  /** Eigenvalues of the volumetric tensor, cm², largest first. */
  eigenvaluesCm2: Vec3;
  /** Semi-axes a ≥ b ≥ c of the formation's ellipsoid (√eigenvalues), cm. */
  semiAxesCm: Vec3;
  /** Unit eigenvectors, in the same order; the last is the direction the formation sees least. */
  axes: [Vec3, Vec3, Vec3];
  /** E = 1 − b/a: 0 for a regular tetrahedron, near 1 for points strung along a line. */
  elongation: number;
  /** P = 1 − c/b: 0 for a regular tetrahedron, near 1 for points nearly in one plane. */
  planarity: number;
  /** Plain-words shape: regular enough, elongated, flat, or both. */
  shape: 'good' | 'elongated' | 'flat' | 'flat-and-elongated';
}

export interface FourPointResult {
  method: 'reciprocal-vectors' | 'least-squares';
  unit: string;
  /** Gradient of the field, unit per cm, (x, y, z). */
  gradientPerCm: Vec3;
  gradientMagnitudePerCm: number;
  /** Unit vector the field grows fastest along; null when the gradient is zero. */
  gradientDirection: Vec3 | null;
  /** Mesocentre (mean position) of the points, cm, and the fitted value there. */
  centreCm: Vec3;
  valueAtCentre: number;
  /** The four reciprocal vectors, 1/cm (four points only). */
  reciprocalVectorsPerCm: Vec3[] | null;
  /** Reading minus the fitted linear field at each point; zero for four points. */
  residuals: number[];
  residualRms: number;
  quality: FormationQuality;
  warnings: string[];
}

const sub = (a: readonly number[], b: readonly number[]): Vec3 => [a[0]! - b[0]!, a[1]! - b[1]!, a[2]! - b[2]!];
const dot = (a: readonly number[], b: readonly number[]) => a[0]! * b[0]! + a[1]! * b[1]! + a[2]! * b[2]!;
const cross = (a: Vec3, b: Vec3): Vec3 => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];
const norm = (a: readonly number[]) => Math.hypot(a[0]!, a[1]!, a[2]!);
const round = (v: number, digits = 3) => +v.toPrecision(digits);
const name = (p: { label?: string | undefined }, i: number) => p.label || `point ${i + 1}`;

/** Mean position of the points, cm. */
function mesocentre(positions: readonly Vec3[]): Vec3 {
  const c: Vec3 = [0, 0, 0];
  for (const p of positions) for (let k = 0; k < 3; k++) c[k] = c[k]! + p[k]! / positions.length;
  return c;
}

/** The volumetric tensor (1/N)·Σ (r − r_b)(r − r_b)ᵀ, cm², as rows. */
export function volumetricTensor(positions: readonly Vec3[]): number[][] {
  const c = mesocentre(positions);
  const r = [
    [0, 0, 0],
    [0, 0, 0],
    [0, 0, 0],
  ];
  for (const p of positions) {
    const d = sub(p, c);
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) r[i]![j]! += (d[i]! * d[j]!) / positions.length;
  }
  return r;
}

/** Eigenvalues (largest first), semi-axes, axes, elongation and planarity of a formation. */
export function formationQuality(positions: readonly Vec3[]): FormationQuality {
  // The tensor is decomposed for the formation scaled to an extent of 1 about its centre, then scaled back:
  // the same eigenvectors, eigenvalues × extent². At the formation's own scale, coordinates a class would
  // never type but a request may hold (1e-300 cm beside 1e6 cm) leave subnormal entries on which ml-matrix's
  // tql2 runs past the end of its arrays; so offsets below 1e-12 of the extent, far below any measurement, count
  // as 0.
  const centre = mesocentre(positions);
  const extent = Math.max(...positions.flatMap((p) => sub(p, centre).map(Math.abs)));
  const scaled = (x: number) => (Math.abs(x / extent) < 1e-12 ? 0 : x / extent);
  const unit = extent > 0 ? positions.map((p) => sub(p, centre).map(scaled) as Vec3) : positions;
  const eig = new EigenvalueDecomposition(new Matrix(volumetricTensor(unit)), { assumeSymmetric: true });
  const vectors = eig.eigenvectorMatrix;
  const order = eig.realEigenvalues
    .map((value, i) => ({
      value: Math.max(0, value) * (extent > 0 ? extent * extent : 1),
      axis: vectors.getColumn(i) as Vec3,
    }))
    .sort((x, y) => y.value - x.value);
  const [a, b, c] = order.map((o) => Math.sqrt(o.value)) as Vec3;
  const elongation = a > 0 ? 1 - b / a : 1;
  const planarity = b > 0 ? 1 - c / b : 1;
  const elongated = elongation > FOUR_POINT_SHAPE_WARN;
  const flat = planarity > FOUR_POINT_SHAPE_WARN;
  return {
    eigenvaluesCm2: order.map((o) => o.value) as Vec3,
    semiAxesCm: [a, b, c],
    axes: order.map((o) => o.axis.map((x) => x / norm(o.axis))) as [Vec3, Vec3, Vec3],
    elongation,
    planarity,
    shape: flat && elongated ? 'flat-and-elongated' : flat ? 'flat' : elongated ? 'elongated' : 'good',
  };
}

/**
 * The reciprocal vectors of a tetrahedron (1/cm for positions in cm); they sum to zero and Σ k_α·f_α is the
 * gradient of the linear field through the four readings. Null when the four points are coplanar.
 */
export function reciprocalVectors(positions: readonly [Vec3, Vec3, Vec3, Vec3]): Vec3[] | null {
  const out: Vec3[] = [];
  for (let alpha = 0; alpha < 4; alpha++) {
    const [beta, gamma, lambda] = positions.filter((_, i) => i !== alpha) as [Vec3, Vec3, Vec3];
    const n = cross(sub(gamma, beta), sub(lambda, beta));
    const volume6 = dot(sub(positions[alpha]!, beta), n);
    if (volume6 === 0 || !Number.isFinite(volume6)) return null;
    out.push([n[0] / volume6, n[1] / volume6, n[2] / volume6]);
  }
  return out;
}

/** Least-squares gradient R⁻¹·(1/N)·Σ (f − f̄)(r − r_b) of any number of points with an invertible R. */
function leastSquaresGradient(positions: readonly Vec3[], values: readonly number[]): Vec3 {
  const c = mesocentre(positions);
  const mean = values.reduce((s, v) => s + v, 0) / values.length;
  const rhs = [0, 0, 0];
  positions.forEach((p, i) => {
    const d = sub(p, c);
    for (let k = 0; k < 3; k++) rhs[k]! += ((values[i]! - mean) * d[k]!) / positions.length;
  });
  const g = solve(new Matrix(volumetricTensor(positions)), Matrix.columnVector(rhs), true);
  return g.getColumn(0) as Vec3;
}

/** Refuses two sensors at one place; `sizeCm` is the formation's largest semi-axis. */
function sameplaceCheck(input: FourPointInput, sizeCm: number): void {
  const pts = input.points;
  for (let i = 0; i < pts.length; i++) {
    for (let j = i + 1; j < pts.length; j++) {
      if (norm(sub(pts[i]!.positionCm, pts[j]!.positionCm)) <= SAME_PLACE_FRACTION * sizeCm) {
        throw new InputError(
          `${name(pts[i]!, i)} and ${name(pts[j]!, j)} are at the same position; every sensor needs its own place.`,
          { [`points.${j}.positionCm`]: [`same position as ${name(pts[i]!, i)}`] },
        );
      }
    }
  }
}

/** A direction as a reader would say it, to two decimals: "(0.00, 0.00, 1.00)". */
const directionText = (v: Vec3) => `(${v.map((x) => (Math.abs(x) < 0.005 ? 0 : x).toFixed(2)).join(', ')})`;

/**
 * The gradient of the field read at the points and the quality of their formation. Throws InputError for
 * two points at one place, points on a line, or a formation too flat or too thin to trust
 * (planarity or elongation above FOUR_POINT_SHAPE_REFUSE).
 */
export function fourPointGradient(input: FourPointInput): FourPointResult {
  const positions = input.points.map((p) => [...p.positionCm] as Vec3);
  const values = input.points.map((p) => p.value);
  const quality = formationQuality(positions);
  const [a, b, c] = quality.semiAxesCm;
  if (a === 0) {
    throw new InputError('All points are at the same position; spread the sensors out.', {
      points: ['all at one position'],
    });
  }
  sameplaceCheck(input, a);
  const across = directionText(quality.axes[2]);
  if (b <= SAME_PLACE_FRACTION * a || quality.elongation > FOUR_POINT_SHAPE_REFUSE) {
    throw new InputError(
      `The points lie almost on one line (elongation ${round(quality.elongation, 2)}); they only see how the field changes along it. Move sensors away from the line so they span a solid shape.`,
      { points: ['points nearly on a line'] },
    );
  }
  if (c <= SAME_PLACE_FRACTION * a || quality.planarity > FOUR_POINT_SHAPE_REFUSE) {
    throw new InputError(
      `The points lie almost in one plane (planarity ${round(quality.planarity, 2)}), like three points do: they cannot see how the field changes across that plane, along ${across}. Raise or lower one sensor so the four make a solid shape.`,
      { points: ['points nearly in one plane'] },
    );
  }
  const warnings: string[] = [];
  if (quality.planarity > FOUR_POINT_SHAPE_WARN) {
    warnings.push(
      `The formation is rather flat (planarity ${round(quality.planarity, 2)}): the part of the gradient across it, along ${across}, is the least certain. A sensor farther out of the plane helps.`,
    );
  }
  if (quality.elongation > FOUR_POINT_SHAPE_WARN) {
    warnings.push(
      `The formation is rather long and thin (elongation ${round(quality.elongation, 2)}): the gradient across its long axis is less certain than along it.`,
    );
  }
  const centreCm = mesocentre(positions);
  const valueAtCentre = values.reduce((s, v) => s + v, 0) / values.length;
  let gradientPerCm: Vec3;
  let reciprocal: Vec3[] | null = null;
  if (positions.length === 4) {
    reciprocal = reciprocalVectors(positions as [Vec3, Vec3, Vec3, Vec3])!;
    gradientPerCm = [0, 1, 2].map((k) => reciprocal!.reduce((s, kv, i) => s + kv[k]! * values[i]!, 0)) as Vec3;
  } else {
    gradientPerCm = leastSquaresGradient(positions, values);
  }
  const residuals = positions.map((p, i) => values[i]! - (valueAtCentre + dot(gradientPerCm, sub(p, centreCm))));
  const magnitude = norm(gradientPerCm);
  return {
    method: positions.length === 4 ? 'reciprocal-vectors' : 'least-squares',
    unit: input.unit,
    gradientPerCm,
    gradientMagnitudePerCm: magnitude,
    gradientDirection: magnitude > 0 ? (gradientPerCm.map((x) => x / magnitude) as Vec3) : null,
    centreCm,
    valueAtCentre,
    reciprocalVectorsPerCm: reciprocal,
    residuals,
    residualRms: Math.sqrt(residuals.reduce((s, r) => s + r * r, 0) / residuals.length),
    quality,
    warnings,
  };
}
