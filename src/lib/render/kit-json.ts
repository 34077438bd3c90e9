/**
 * The kit as JSON for other tools and for the 3D preview: pieces (with their hinge trees), sheets with
 * placements, wire-boom threads, the cut list and the STL's print plate in words (its own scale, parts in gluing
 * order, substitutes). Lengths in mm at kit scale; angles in radians.
 */
import type { KitLayout } from '../layout/types';

/** Version of this JSON layout; bump on any incompatible change. */
export const KIT_JSON_FORMAT = 'kitwright-kit/1';

/** The JSON text of a kit, numbers rounded to 1 µm (and angles to 1e-9 rad) to keep files small. */
export function kitJson(kit: KitLayout, contentHash?: string, print?: unknown): string {
  return JSON.stringify({ format: KIT_JSON_FORMAT, contentHash, ...kit, print }, (key, value) => {
    if (typeof value !== 'number') return value;
    const digits = /Rad$/.test(key) ? 9 : 3;
    return Number(value.toFixed(digits));
  });
}
