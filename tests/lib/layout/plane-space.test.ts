/**
 * Points of a piece's flat plane (y up) and of a sheet (y down) are different types: the compiler refuses one
 * where the other is expected (each @ts-expect-error below fails the type check the day it compiles), and
 * placementApply is the crossing. At run time both are plain [x, y] tuples.
 */
import { describe, expect, test } from 'vitest';
import type { Vec2Mm } from '../../../src/lib/geometry/types';
import { placementApply } from '../../../src/lib/layout/placement';
import type { SheetVec2Mm } from '../../../src/lib/layout/types';
import { labelPointInside } from '../../../src/lib/render/label-placement';

describe('plane spaces', () => {
  test('placementApply takes a flat point to the sheet, y up becoming y down', () => {
    const flat: Vec2Mm = [3, 4];
    const onSheet: SheetVec2Mm = placementApply({ xMm: 10, yMm: 20, rotationRad: 0, mirrored: false }, flat);
    // A reflection in the x axis, then a translation: (3, 4) lands 4 mm above (10, 20), at (13, 16).
    expect(onSheet).toEqual([13, 16]);
  });

  test('a point of one plane is refused where one of the other is expected; the tag is type-only', () => {
    const flat: Vec2Mm = [3, 4];
    const onSheet: SheetVec2Mm = [13, 16];
    // @ts-expect-error a sheet point is not a flat point
    const asFlat: Vec2Mm = onSheet;
    // @ts-expect-error a flat point is not a sheet point
    const asSheet: SheetVec2Mm = flat;
    // @ts-expect-error a flat point tested against a sheet polygon
    labelPointInside(flat, [onSheet]);
    // @ts-expect-error a sheet point placed again as if it were flat
    placementApply({ xMm: 0, yMm: 0, rotationRad: 0, mirrored: false }, onSheet);
    expect([asFlat, asSheet]).toEqual([
      [13, 16],
      [3, 4],
    ]);
  });
});
