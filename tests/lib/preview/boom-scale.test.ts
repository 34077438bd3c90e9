import { describe, expect, test } from 'vitest';
import { demoModel } from '../geometry/fixtures';
import { boomScale, PERSON_HEIGHT_MM } from '../../../src/lib/preview/boom-scale';

// Skein span by hand (see tests/lib/layout/venues.test.ts): the ±x booms leave the flats at the 1.2 m apothem,
// 2·(1.2 + 35) = 72.4 m; the ±y booms leave sides 1 and 4 0.6 m from their centres, 2·(1.2·sin 60° + 0.6·sin 30° + 35).
const spanX = 72_400;
const spanY = 2 * (1.2 * (Math.sqrt(3) / 2) + 0.6 * 0.5 + 35) * 1000;

describe('boomScale', () => {
  test('divides the Skein probe span by the scale and compares it with a person', () => {
    const s = boomScale(demoModel('skein-probe'), 20);
    expect(s.footprintMm[0]).toBeCloseTo(spanY / 20, 3);
    expect(s.footprintMm[1]).toBeCloseTo(spanX / 20, 3);
    expect(s.personMultiple).toBeCloseTo(spanY / 20 / PERSON_HEIGHT_MM, 9);
    expect(s.booms).toHaveLength(4);
    for (const b of s.booms) expect(b.deployedLengthMm).toBeCloseTo(35_000 / 20, 9);
  });

  test('fits the Skein probe in a classroom at 1:20 but not at 1:5', () => {
    // 9 × 7 m less a 5 % border each side is 8.1 × 6.3 m: 3.63 m fits, 14.5 m does not.
    expect(boomScale(demoModel('skein-probe'), 20).fitsClassroom).toBe(true);
    const big = boomScale(demoModel('skein-probe'), 5);
    expect(big.fitsClassroom).toBe(false);
    expect(big.description).toMatch(/does not fit/);
  });

  test('says in words how long the span is and how it compares with a person', () => {
    const s = boomScale(demoModel('skein-probe'), 20);
    expect(s.description).toBe(
      'With its booms out, the model spans 3.63 m × 3.62 m at 1:20: about 2.1 times the height of a 1.7 m person. It fits a classroom (9 × 7 m) with room to walk around it.',
    );
  });

  test('describes a model without booms without mentioning them', () => {
    // 24 facets with corners on the 0.5 m circle: 0.5·cos(π/24) = 0.4957 m across the flats, 9.9 cm at 1:5.
    expect(boomScale(demoModel('thermal-puck'), 5).description).toMatch(
      /^The model spans 9\.9 cm × 9\.9 cm at 1:5: far shorter than/,
    );
  });
});
