import { themeColors } from './src/styles/theme-colors.mjs';

/**
 * Kitwright's design tokens; colours come from src/styles/theme-colors.mjs (checked for WCAG 2.2 AA contrast).
 * @type {import('tailwindcss').Config}
 */
export default {
  content: ['./src/**/*.{astro,html,ts,tsx,md,mdx}', './content/**/*.{md,mdx}'],
  theme: {
    extend: {
      colors: themeColors,
      fontFamily: {
        sans: ['"Atkinson Hyperlegible Next"', 'system-ui', 'sans-serif'],
        display: ['"Space Grotesk Variable"', '"Atkinson Hyperlegible Next"', 'system-ui', 'sans-serif'],
      },
      borderRadius: { card: '0.9rem' },
      maxWidth: { page: '72rem' },
    },
  },
};
