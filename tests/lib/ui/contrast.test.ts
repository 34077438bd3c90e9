import { describe, expect, it } from 'vitest';
import { themeColors as c } from '../../../src/styles/theme-colors.mjs';
import { contrastRatio } from '../../../src/lib/ui/contrast';

describe('contrastRatio', () => {
  it('gives 21:1 for black on white and 1:1 for equal colours', () => {
    // WCAG 2.2, "contrast ratio": (L1 + 0.05) / (L2 + 0.05) ranges from 1 to 21.
    expect(contrastRatio('#000000', '#ffffff')).toBeCloseTo(21, 6);
    expect(contrastRatio('#0d6b62', '#0d6b62')).toBeCloseTo(1, 6);
  });

  it('puts #767676 on white just above 4.5:1', () => {
    // from memory: #767676 is the lightest grey commonly quoted as passing 4.5:1 on white (≈ 4.54).
    expect(contrastRatio('#767676', '#ffffff')).toBeGreaterThan(4.5);
    expect(contrastRatio('#777777', '#ffffff')).toBeLessThan(4.5);
  });

  it('returns NaN for a malformed colour', () => {
    expect(contrastRatio('teal', '#ffffff')).toBeNaN();
  });
});

describe('theme colour pairings', () => {
  // Every pairing the UI uses for text must meet WCAG 2.2 AA for normal text (SC 1.4.3: 4.5:1).
  const pairs: [string, string, string][] = [
    ['ink on paper', c.ink.DEFAULT, c.paper.DEFAULT],
    ['ink-soft on paper', c.ink.soft, c.paper.DEFAULT],
    ['ink-faint on white', c.ink.faint, '#ffffff'],
    ['ink-soft on paper-deep', c.ink.soft, c.paper.deep],
    ['white on fold (primary button)', '#ffffff', c.fold.DEFAULT],
    ['fold-dark on fold-light (current nav item)', c.fold.dark, c.fold.light],
    ['fold-dark link on paper', c.fold.dark, c.paper.DEFAULT],
    ['caution on caution-light', c.caution.DEFAULT, c.caution.light],
    ['danger on white (field errors)', c.danger.DEFAULT, '#ffffff'],
    ['danger on danger-light', c.danger.DEFAULT, c.danger.light],
    ['orbit on orbit-light', c.orbit.DEFAULT, c.orbit.light],
  ];
  it.each(pairs)('%s meets 4.5:1', (_name, fg, bg) => {
    expect(contrastRatio(fg, bg)).toBeGreaterThanOrEqual(4.5);
  });
});
