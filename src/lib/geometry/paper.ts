/**
 * Paper weight and the allowances it implies: sheet thickness, tab depth, overlap strips, and the chord
 * tolerance used to draw curved outlines as polylines. Lengths in mm on the printed sheet (not scaled).
 */
export const PAPER_GSM_MIN = 80;
export const PAPER_GSM_MAX = 300;
/** Paper weight a new kit starts with: card stock that folds cleanly (common practice, no source). */
export const PAPER_GSM_DEFAULT = 160;
/** From memory: office paper and card are roughly 0.7–0.9 g/cm³; 0.8 g/cm³ is assumed throughout. */
export const PAPER_DENSITY_G_PER_CM3 = 0.8;
/**
 * Largest gap between a true arc and its polyline, mm: half a typical 0.1 mm printed line, so the
 * polyline cannot be told from the arc on paper (common practice, no source).
 */
export const CHORD_TOLERANCE_MM = 0.05;

/** Sheet thickness, mm, from its weight in g/m² at PAPER_DENSITY_G_PER_CM3 (80 g/m² → 0.1 mm). */
export function paperThicknessMm(gsm: number): number {
  // g/m² ÷ (g/cm³ · 10⁶ cm³/m³) = m; × 1000 = mm.
  return (gsm / (PAPER_DENSITY_G_PER_CM3 * 1e6)) * 1000;
}

/**
 * The tab depth the paper wants, mm: 6 mm plus ten sheet thicknesses (thick card needs more glue area
 * to hold its spring), common practice, no source. Capped at 0.8 of the edge it sits on.
 */
export function paperTabDepthMm(gsm: number, edgeLengthMm = Infinity): number {
  return Math.min(6 + 10 * paperThicknessMm(gsm), 0.8 * edgeLengthMm);
}

/** Width of a tube's overlap strip, mm: a tab depth, so the seam holds like any other tab. */
export function paperOverlapMm(gsm: number): number {
  return paperTabDepthMm(gsm);
}

/** Points along a circular arc (centre, radius mm, angles rad), both ends included, within CHORD_TOLERANCE_MM. */
export function arcPoints(
  centre: readonly [number, number],
  radiusMm: number,
  fromRad: number,
  toRad: number,
): [number, number][] {
  const span = toRad - fromRad;
  // Sagitta of a chord subtending δ is R·(1 − cos(δ/2)); keep it under the tolerance.
  const maxStep = radiusMm > CHORD_TOLERANCE_MM ? 2 * Math.acos(1 - CHORD_TOLERANCE_MM / radiusMm) : Math.PI;
  const steps = Math.max(1, Math.ceil(Math.abs(span) / maxStep));
  const points: [number, number][] = [];
  for (let i = 0; i <= steps; i++) {
    const a = fromRad + (span * i) / steps;
    points.push([centre[0] + radiusMm * Math.cos(a), centre[1] + radiusMm * Math.sin(a)]);
  }
  return points;
}
