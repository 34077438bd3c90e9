/**
 * Kitwright's colours, our own: "ink" for text on "paper", a teal "fold" for actions and folds, an amber
 * "caution", a rust "danger" and a night-blue "orbit". Text pairings are checked for WCAG 2.2 AA in
 * tests/lib/ui/contrast.test.ts.
 */
export const themeColors = {
  paper: { DEFAULT: '#fbf9f4', deep: '#f1ede3' },
  ink: { DEFAULT: '#1b2330', soft: '#46505f', faint: '#6b7482' },
  fold: { DEFAULT: '#0d6b62', dark: '#084a44', light: '#d6efec' },
  caution: { DEFAULT: '#8a5300', light: '#fbefd9' },
  danger: { DEFAULT: '#b3261e', light: '#fbe4e2' },
  orbit: { DEFAULT: '#2b3a67', light: '#e3e7f4' },
};
