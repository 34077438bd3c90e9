/**
 * The real size of an imported mesh for people to read: its three sides in one unit (mm, cm or m) picked by
 * the largest side, three significant figures each, so the unit question's options compare at a glance.
 */

import type { MeshUnit } from '../mesh/mesh-units';

const DIGITS = new Intl.NumberFormat('en-US', { maximumSignificantDigits: 3 });

/** The unit a length reads best in: mm below 1 cm, cm below 1 m, else m. */
function sizeUnit(largestM: number): { unit: 'mm' | 'cm' | 'm'; perM: number } {
  if (largestM < 0.01) return { unit: 'mm', perM: 1000 };
  if (largestM < 1) return { unit: 'cm', perM: 100 };
  return { unit: 'm', perM: 1 };
}

/** "6 × 6 × 6 cm" for sides x, y, z in metres; "—" when a side is not a finite number. */
export function meshSizeLabel(sidesM: readonly [number, number, number]): string {
  if (!sidesM.every(Number.isFinite)) return '—';
  const { unit, perM } = sizeUnit(Math.max(...sidesM.map(Math.abs)));
  return `${sidesM.map((s) => DIGITS.format(s * perM)).join(' × ')} ${unit}`;
}

/** Each unit a mesh file's numbers may be in, in words. */
export const MESH_UNIT_WORDS: Record<MeshUnit, string> = {
  mm: 'millimetres',
  cm: 'centimetres',
  m: 'metres',
  in: 'inches',
};
