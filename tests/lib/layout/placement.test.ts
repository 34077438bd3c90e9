import SVGPathCommander from 'svg-path-commander';
import { describe, expect, test } from 'vitest';
import {
  placementApply,
  placementApplyAngle,
  placementAtCorner,
  placementBounds,
} from '../../../src/lib/layout/placement';
import { pieceOrientationRad } from '../../../src/lib/layout/piece-orientation';
import { cubeNetPiece, turnedRectPiece } from '../../fixtures/pieces/pieces';

describe('placementApply', () => {
  // Reference: SVG's transform="translate(x y) rotate(θ°) scale(±1 −1)" as evaluated by svg-path-commander's
  // matrix (SVG 1.1 §7.4), which is the rule documented in layout/types.ts.
  test('matches the SVG transform translate · rotate · scale(±1, −1) for every quarter and odd angle', () => {
    const piece = cubeNetPiece('c', 30);
    for (const rotationRad of [0, 0.3, Math.PI / 2, 2.5, -1.2]) {
      for (const mirrored of [false, true]) {
        const pose = { xMm: 12.5, yMm: -7, rotationRad, mirrored };
        const d = SVGPathCommander.pathToString(
          piece.outlineMm.map(([x, y], i) => [i === 0 ? 'M' : 'L', x, y]) as never,
        );
        const moved = SVGPathCommander.normalizePath(
          SVGPathCommander.transformPath(d, {
            translate: [pose.xMm, pose.yMm],
            rotate: (rotationRad * 180) / Math.PI,
            scale: [mirrored ? -1 : 1, -1],
            origin: [0, 0],
          }),
        );
        piece.outlineMm.forEach((p, i) => {
          const seg = moved[i]!;
          const [x, y] = placementApply(pose, p);
          expect(seg[seg.length - 2]).toBeCloseTo(x, 9);
          expect(seg[seg.length - 1]).toBeCloseTo(y, 9);
        });
      }
    }
  });

  test('turns a flat +x direction clockwise on the page by the rotation', () => {
    expect(placementApplyAngle({ xMm: 0, yMm: 0, rotationRad: 0.5, mirrored: false }, 0)).toBeCloseTo(0.5, 12);
    // Flat +y is up on the page, i.e. −90° in the y-down sheet frame.
    expect(placementApplyAngle({ xMm: 0, yMm: 0, rotationRad: 0, mirrored: false }, Math.PI / 2)).toBeCloseTo(
      -Math.PI / 2,
      12,
    );
  });
});

describe('placementAtCorner', () => {
  test('puts the top-left corner of the placed box at the requested point', () => {
    const piece = cubeNetPiece('c', 25);
    const box = placementBounds(placementAtCorner(piece, 1.1, 40, 60), piece);
    expect(box.xMm).toBeCloseTo(40, 9);
    expect(box.yMm).toBeCloseTo(60, 9);
  });
});

describe('pieceOrientationRad', () => {
  test('turns a slanted rectangle back to its own width and height (the minimum-area box)', () => {
    for (const angle of [0.2, 0.7, -1.0, 2.8]) {
      const piece = turnedRectPiece('s', 150, 20, angle);
      const box = placementBounds(
        { xMm: 0, yMm: 0, rotationRad: pieceOrientationRad(piece.outlineMm), mirrored: false },
        piece,
      );
      expect(box.widthMm).toBeCloseTo(150, 6);
      expect(box.heightMm).toBeCloseTo(20, 6);
    }
  });

  test('leaves an axis-aligned rectangle unturned', () => {
    expect(
      pieceOrientationRad([
        [0, 0],
        [100, 0],
        [100, 30],
        [0, 30],
      ]),
    ).toBe(0);
  });
});
