/**
 * How many wall facets a body's paper pattern uses. A cylinder's facets only stand in for a round wall, and
 * at a small scale one wall (and the glue-ring tooth on it) per facet is too narrow for a class to fold and
 * cut; the pattern then uses fewer, wider facets, as wide as the grade band's buildability minimums ask.
 * The assembled mesh (STL) keeps the model's own count.
 */
import { CYLINDER_FACETS_MIN, type Body } from './model-schema';
import { BUILDABILITY_MINIMUMS, type BuildGradeBand } from './buildability';

/**
 * The narrowest wall a band's cylinder pattern may have, mm: each wall is a strip between two parallel folds,
 * so it must be as wide as the band's fold gap and its narrowest strip (and so is the ring tooth on it).
 */
export function bodyPatternWallMinMm(band: BuildGradeBand): number {
  const min = BUILDABILITY_MINIMUMS[band];
  return Math.max(min.foldGapMm, min.stripMm);
}

/**
 * The wall count of `body`'s flat pattern at 1:scaleDenominator for `band`: a prism's sides or a box's 4
 * unchanged; for a cylinder the largest n from its `facets` down to CYLINDER_FACETS_MIN whose walls (chords
 * 2R·sin(π/n) of the circle of radius R mm at kit scale, corners on it as in bodyBaseM) are at least
 * bodyPatternWallMinMm(band) wide, or CYLINDER_FACETS_MIN when even that is narrower (the buildability
 * check then reports the narrow walls).
 */
export function bodyPatternFacets(body: Body, scaleDenominator: number, band: BuildGradeBand): number {
  if (body.kind === 'box') return 4;
  if (body.kind === 'prism') return body.sides;
  const radiusMm = ((body.diameterM / 2) * 1000) / scaleDenominator;
  const wallMinMm = bodyPatternWallMinMm(band);
  // Walls widen as n falls: the largest n with 2R·sin(π/n) ≥ w is ⌊π / asin(w / 2R)⌋ (w ≤ 2R).
  if (wallMinMm > 2 * radiusMm) return CYLINDER_FACETS_MIN;
  const widest = Math.floor(Math.PI / Math.asin(wallMinMm / (2 * radiusMm)) + 1e-9);
  return Math.max(CYLINDER_FACETS_MIN, Math.min(body.facets, widest));
}

/** The body as its paper pattern unfolds it: `body` itself unless bodyPatternFacets caps a cylinder's facets. */
export function bodyPatternShape(body: Body, scaleDenominator: number, band: BuildGradeBand): Body {
  if (body.kind !== 'cylinder') return body;
  const facets = bodyPatternFacets(body, scaleDenominator, band);
  return facets === body.facets ? body : { ...body, facets };
}
