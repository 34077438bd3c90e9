import { describe, expect, it } from 'vitest';
import { CleanroomInputSchema, cleanroomClassify } from '../../../src/lib/analysis/cleanroom';

function room(
  locations: number[][],
  sizesUm = [0.5, 1, 5],
  floorAreaM2 = 1,
  volume = 28.3,
  volumeUnit: 'L' | 'm3' = 'L',
) {
  return CleanroomInputSchema.parse({
    floorAreaM2,
    sizesUm,
    locations: locations.map((counts, i) => ({ label: `L${i + 1}`, samples: [{ volume, volumeUnit, counts }] })),
  });
}

describe('cleanroomClassify', () => {
  it('turns counts per litre into counts per m³', () => {
    // 1 m³ = 1000 L (SI): 100 particles in 28.3 L are 3534 per m³.
    const r = cleanroomClassify(room([[100, 20, 1]]));
    expect(r.locations[0]!.concentrationPerM3[0]).toBeCloseTo(100 / 0.0283, 6);
  });

  it('gives Class 7 when the worst location is just under the Class 7 limit at 0.5 µm', () => {
    // ISO 14644-1:2015 Table 1: Class 7 allows 352 000 /m³ at 0.5 µm, 83 200 at 1 µm, 2 930 at 5 µm.
    const r = cleanroomClassify(
      room(
        [
          [351_000, 80_000, 2_000],
          [10_000, 2_000, 100],
        ],
        [0.5, 1, 5],
        1,
        1,
        'm3',
      ),
    );
    expect(r.isoClass).toBe(7);
    expect(r.classLimitsPerM3).toEqual([352_000, 83_200, 2_930]);
  });

  it('judges every location on its own: one dirty location sets the class', () => {
    // ISO 14644-1:2015 A.5.3 (from memory): each location's mean must not exceed the limit.
    const clean = [1_000, 100, 0];
    const r = cleanroomClassify(room([clean, clean, clean, [400_000, 90_000, 3_000]], [0.5, 1, 5], 4, 1, 'm3'));
    expect(r.isoClass).toBe(8);
  });

  it('does not offer Class 5 when 5 µm is considered, and says so', () => {
    // ISO 14644-1:2015 Table 1 leaves Class 5 at 5 µm blank.
    const r = cleanroomClassify(room([[1_000, 200, 0]], [0.5, 1, 5], 1, 1, 'm3'));
    expect(r.isoClass).toBe(6);
    expect(r.warnings.join(' ')).toMatch(/not defined at 5 µm/);
    expect(cleanroomClassify(room([[1_000, 200]], [0.5, 1], 1, 1, 'm3')).isoClass).toBe(5);
  });

  it('averages the samples at a location', () => {
    const r = cleanroomClassify(
      CleanroomInputSchema.parse({
        floorAreaM2: 1,
        sizesUm: [0.5],
        locations: [
          {
            label: 'A',
            samples: [
              { volume: 1, volumeUnit: 'm3', counts: [3_000] },
              { volume: 1, volumeUnit: 'm3', counts: [4_000] },
            ],
          },
        ],
      }),
    );
    expect(r.locations[0]!.concentrationPerM3[0]).toBe(3_500);
    expect(r.isoClass).toBe(5);
  });

  it('adds differential counts into cumulative ones', () => {
    const diff = CleanroomInputSchema.parse({
      floorAreaM2: 1,
      sizesUm: [0.5, 1, 5],
      countsAre: 'differential',
      locations: [{ label: 'A', samples: [{ volume: 1, volumeUnit: 'm3', counts: [300, 50, 7] }] }],
    });
    expect(cleanroomClassify(diff).locations[0]!.concentrationPerM3).toEqual([357, 57, 7]);
  });

  it('warns when fewer locations were sampled than Table A.1 asks for the floor area', () => {
    const r = cleanroomClassify(room([[10, 1, 0]], [0.5, 1, 5], 52));
    expect(r.locationsRequired).toBe(10);
    expect(r.warnings.join(' ')).toMatch(/at least 10 sampling locations/);
  });

  it('gives no class when even Class 9 is exceeded', () => {
    expect(cleanroomClassify(room([[40_000_000]], [0.5], 1, 1, 'm3')).isoClass).toBeNull();
  });
});

describe('CleanroomInputSchema', () => {
  it('refuses sizes outside the ISO list, negative or fractional counts, and count lists of the wrong length', () => {
    const base = {
      floorAreaM2: 1,
      sizesUm: [0.5],
      locations: [{ label: 'A', samples: [{ volume: 1, volumeUnit: 'L', counts: [1] }] }],
    };
    expect(CleanroomInputSchema.safeParse(base).success).toBe(true);
    expect(CleanroomInputSchema.safeParse({ ...base, sizesUm: [0.7] }).success).toBe(false);
    expect(
      CleanroomInputSchema.safeParse({
        ...base,
        locations: [{ label: 'A', samples: [{ volume: 1, volumeUnit: 'L', counts: [-1] }] }],
      }).success,
    ).toBe(false);
    expect(
      CleanroomInputSchema.safeParse({
        ...base,
        locations: [{ label: 'A', samples: [{ volume: 1, volumeUnit: 'L', counts: [1.5] }] }],
      }).success,
    ).toBe(false);
    expect(
      CleanroomInputSchema.safeParse({
        ...base,
        locations: [{ label: 'A', samples: [{ volume: 1, volumeUnit: 'L', counts: [1, 2] }] }],
      }).success,
    ).toBe(false);
  });
});
