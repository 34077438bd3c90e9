import { describe, expect, it } from 'vitest';
import { bytesFormat, numberFormat } from '../../../src/lib/tools/number-format';
import { uploadSizeProblem } from '../../../src/lib/tools/upload-check';

describe('numberFormat', () => {
  it('rounds to significant figures in plain notation in the everyday range', () => {
    expect(numberFormat(0.44912)).toBe('0.449');
    expect(numberFormat(352000)).toBe('352,000');
  });

  it('uses powers of ten outside it', () => {
    expect(numberFormat(1.234e-5)).toBe('1.23 × 10⁻⁵');
    expect(numberFormat(2.5e7, 2)).toBe('2.5 × 10⁷');
  });

  it('gives a dash for null and non-finite values', () => {
    expect(numberFormat(null)).toBe('—');
    expect(numberFormat(Number.NaN)).toBe('—');
  });
});

describe('uploadSizeProblem', () => {
  it('refuses a file above the limit, saying both sizes', () => {
    expect(uploadSizeProblem('big.csv', 50_000_000, 16_000_000)).toBe(
      '“big.csv” is 50 MB; this tool reads files up to 16 MB. Send a shorter record or a lower sample rate.',
    );
  });

  it('accepts a file at the limit and refuses an empty one', () => {
    expect(uploadSizeProblem('a.csv', 16_000_000, 16_000_000)).toBeNull();
    expect(uploadSizeProblem('a.csv', 0, 10)).toMatch(/empty/);
  });

  it('states kilobytes for small limits', () => {
    expect(bytesFormat(200_000)).toBe('200 kB');
  });
});
