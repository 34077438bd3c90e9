/**
 * How many wall facets a body's paper pattern uses. A cylinder's facets only stand in for a round wall, and
 * at a small scale one tooth of its glue ring per facet is too narrow to cut; the pattern then uses fewer,
 * wider facets. The assembled mesh (STL) keeps the model's own count.
 */
import { CYLINDER_FACETS_MIN, type Body } from './model-schema';
import { TOOTH_BASE_MIN_MM } from './paper';

/**
 * The wall count of `body`'s flat pattern at 1:scaleDenominator: a prism's sides or a box's 4 unchanged; for a
 * cylinder the largest n from its `facets` down to CYLINDER_FACETS_MIN whose walls (chords 2R·sin(π/n) of
 * the circle of radius R mm at kit scale, corners on it as in bodyBaseM) are at least TOOTH_BASE_MIN_MM
 * wide, or CYLINDER_FACETS_MIN when even that is narrower (a cylinder under about 10 mm across).
 */
export function bodyPatternFacets(body: Body, scaleDenominator: number): number {
  if (body.kind === 'box') return 4;
  if (body.kind === 'prism') return body.sides;
  const radiusMm = ((body.diameterM / 2) * 1000) / scaleDenominator;
  // Walls widen as n falls, so the first n from the top that is wide enough is the largest; ≤ 250 steps.
  for (let n = body.facets; n > CYLINDER_FACETS_MIN; n--) {
    if (2 * radiusMm * Math.sin(Math.PI / n) >= TOOTH_BASE_MIN_MM) return n;
  }
  return CYLINDER_FACETS_MIN;
}

/** The body as its paper pattern unfolds it: `body` itself unless bodyPatternFacets caps a cylinder's facets. */
export function bodyPatternShape(body: Body, scaleDenominator: number): Body {
  if (body.kind !== 'cylinder') return body;
  const facets = bodyPatternFacets(body, scaleDenominator);
  return facets === body.facets ? body : { ...body, facets };
}
