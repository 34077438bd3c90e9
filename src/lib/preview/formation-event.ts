/**
 * How the four-point tool tells the 3D formation view what to draw: a window event with the sensors'
 * positions and, when the tool gave one, the gradient at the formation's centre. The tool and the view are
 * separate islands (the view renders with React and three.js, the tool with Preact), so they talk through
 * this one event rather than props.
 */

export const FORMATION_EVENT = 'kitwright:formation';

export interface FormationDetail {
  points: { label: string; positionCm: [number, number, number] }[];
  /** Gradient (unit per cm) and the point it is drawn from; null when the tool refused the formation. */
  gradient: { perCm: [number, number, number]; fromCm: [number, number, number]; unit: string } | null;
}

/** Where the last formation sent is kept, so a view that starts later (client:visible) still shows it. */
const LAST = Symbol.for('kitwright.formation.last');
type Holder = { [LAST]?: FormationDetail };

/** Sends a formation to the view (no-op on the server). */
export function formationSend(detail: FormationDetail): void {
  if (typeof window === 'undefined') return;
  (window as unknown as Holder)[LAST] = detail;
  window.dispatchEvent(new CustomEvent<FormationDetail>(FORMATION_EVENT, { detail }));
}

/** The last formation sent on this page, or null. */
export function formationLast(): FormationDetail | null {
  if (typeof window === 'undefined') return null;
  return (window as unknown as Holder)[LAST] ?? null;
}

/**
 * The arrow to draw for a gradient: from the centre, along the gradient, as long as `lengthCm` (a fixed
 * share of the formation's size, so a weak and a strong gradient both show); null for no or zero gradient.
 */
export function formationArrow(
  gradient: FormationDetail['gradient'],
  lengthCm: number,
): { fromCm: [number, number, number]; toCm: [number, number, number] } | null {
  if (!gradient) return null;
  const m = Math.hypot(...gradient.perCm);
  if (!(m > 0)) return null;
  const to = gradient.fromCm.map((c, i) => c + (gradient.perCm[i]! / m) * lengthCm) as [number, number, number];
  return { fromCm: gradient.fromCm, toCm: to };
}

/** Size of a formation: the largest distance between two of its points, cm (0 for fewer than two). */
export function formationSizeCm(points: FormationDetail['points']): number {
  let size = 0;
  for (const a of points)
    for (const b of points) size = Math.max(size, Math.hypot(...a.positionCm.map((v, i) => v - b.positionCm[i]!)));
  return size;
}
