import { describe, expect, it } from 'vitest';
import { formationArrow, formationSizeCm } from '../../../src/lib/preview/formation-event';
import { fourPointTableRequest } from '../../../src/lib/tools/four-point-table';

describe('fourPointTableRequest', () => {
  it('reads labelled rows into points, skipping blank rows, and places cell problems', () => {
    const rows = [
      { label: 'A', x: '0', y: '0', z: '0', value: '21,5' },
      { label: '', x: '', y: '', z: '', value: '' },
      { label: 'C', x: '40', y: '0', z: 'high', value: '22' },
    ];
    const bad = fourPointTableRequest(rows, '°C');
    expect(bad.input).toBeNull();
    expect(bad.errors['2.z']).toMatch(/not a number/);
    rows[2]!.z = '10';
    const ok = fourPointTableRequest(rows, ' °C ');
    expect(ok.input).toEqual({
      unit: '°C',
      points: [
        { label: 'A', positionCm: [0, 0, 0], value: 21.5 },
        { label: 'C', positionCm: [40, 0, 10], value: 22 },
      ],
    });
    expect(ok.inputOfPath['points.1.positionCm.2']).toBe('2.z');
  });
});

describe('formation view helpers', () => {
  it('draws the arrow along the gradient from the centre, and none for a zero gradient', () => {
    const a = formationArrow({ perCm: [0, 3, 4], fromCm: [1, 1, 1], unit: '°C' }, 10)!;
    // Unit vector (0, 0.6, 0.8) times 10 cm (3-4-5 triangle).
    expect(a.toCm).toEqual([1, 7, 9]);
    expect(formationArrow({ perCm: [0, 0, 0], fromCm: [0, 0, 0], unit: '' }, 10)).toBeNull();
    expect(formationArrow(null, 10)).toBeNull();
  });

  it('measures a formation by its two farthest points', () => {
    const pts = [
      { label: 'A', positionCm: [0, 0, 0] as [number, number, number] },
      { label: 'B', positionCm: [3, 4, 12] as [number, number, number] },
    ];
    expect(formationSizeCm(pts)).toBe(13);
  });
});
