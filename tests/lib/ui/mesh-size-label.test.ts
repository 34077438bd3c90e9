import { describe, expect, it } from 'vitest';
import { meshSizeLabel } from '../../../src/lib/ui/mesh-size-label';

describe('meshSizeLabel', () => {
  it('gives the three sides in the unit that suits the longest one', () => {
    expect(meshSizeLabel([0.06, 0.06, 0.06])).toBe('6 × 6 × 6 cm');
    expect(meshSizeLabel([0.006, 0.004, 0.001])).toBe('6 × 4 × 1 mm');
    expect(meshSizeLabel([2.4, 2.078, 0.9])).toBe('2.4 × 2.08 × 0.9 m');
  });

  it('keeps the inch exact: 60 in is 1.524 m (1 in = 25.4 mm, NIST SP 811 (2008), Appendix B)', () => {
    expect(meshSizeLabel([60 * 0.0254, 0.0254, 0.0254])).toBe('1.52 × 0.0254 × 0.0254 m');
  });

  it('answers a dash for a side that is not a number', () => {
    expect(meshSizeLabel([Number.NaN, 1, 1])).toBe('—');
  });
});
