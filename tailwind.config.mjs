/**
 * Kitwright's design tokens. Colours are our own: "ink" for text on "paper", a teal for folds and actions,
 * an amber for cautions and a rust for errors — every text pairing listed in DEVELOPERS.md meets WCAG 2.2 AA
 * contrast (4.5:1 for text), checked by tests/lib/ui/contrast.test.ts.
 * @type {import('tailwindcss').Config}
 */
export default {
  content: ['./src/**/*.{astro,html,ts,tsx,md,mdx}', './content/**/*.{md,mdx}'],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: '#fbf9f4', deep: '#f1ede3' },
        ink: { DEFAULT: '#1b2330', soft: '#46505f', faint: '#6b7482' },
        fold: { DEFAULT: '#0d6b62', dark: '#084a44', light: '#d6efec' },
        caution: { DEFAULT: '#8a5300', light: '#fbefd9' },
        danger: { DEFAULT: '#b3261e', light: '#fbe4e2' },
        orbit: { DEFAULT: '#2b3a67', light: '#e3e7f4' },
      },
      fontFamily: {
        sans: ['"Atkinson Hyperlegible Next"', 'system-ui', 'sans-serif'],
        display: ['"Space Grotesk Variable"', '"Atkinson Hyperlegible Next"', 'system-ui', 'sans-serif'],
      },
      borderRadius: { card: '0.9rem' },
      maxWidth: { page: '72rem' },
    },
  },
};
