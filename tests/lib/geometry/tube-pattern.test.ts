import { describe, expect, test } from 'vitest';
import { modelPatterns } from '../../../src/lib/geometry/model-patterns';
import { paperOverlapMm } from '../../../src/lib/geometry/paper';
import { pointsBounds } from '../../../src/lib/geometry/vec';
import { model } from './fixtures';

describe('tubePiece (through modelPatterns)', () => {
  const boomModel = model({
    body: { kind: 'box', widthM: 1, depthM: 1, heightM: 1 },
    appendages: [{ kind: 'rigid-boom', id: 'boom', label: 'Boom', face: 'top', lengthM: 4, diameterM: 0.08 }],
  });

  test.each([80, 300])(
    'is one circumference π·d wide plus an overlap strip that widens with paper weight (%i g/m²)',
    (gsm) => {
      const boom = modelPatterns(boomModel, { scaleDenominator: 10, paperGsm: gsm }).pieces.find(
        (p) => p.id === 'boom',
      )!;
      // Lateral area of a cylinder π·d·L (CRC Standard Mathematical Tables): d = 8 mm, L = 400 mm at 1:10.
      expect(boom.faceAreaMm2).toBeCloseTo(Math.PI * 8 * 400, 8);
      const b = pointsBounds(boom.outlineMm);
      expect(b.maxX - b.minX).toBeCloseTo(Math.PI * 8 + paperOverlapMm(gsm), 9);
      expect(b.maxY - b.minY).toBeCloseTo(400, 9);
      expect(boom.hinge.curved).toEqual({ kind: 'tube', radiusMm: 4, lengthMm: 400 });
    },
  );
});
