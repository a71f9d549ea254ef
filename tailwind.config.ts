import type { Config } from 'tailwindcss';
import { palette } from './src/styles/palette.ts';

/** Type scale, fonts and spacing; the colours live in src/styles/palette.ts (the one palette). */
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    colors: palette,
    fontFamily: {
      // Text is set in a serif that reads well at length; controls and labels in a sans.
      serif: ['"Source Serif 4"', 'Georgia', 'Cambria', '"Times New Roman"', 'serif'],
      sans: ['Inter', 'system-ui', '-apple-system', '"Segoe UI"', 'Roboto', 'Arial', 'sans-serif'],
      mono: ['ui-monospace', '"SFMono-Regular"', 'Menlo', 'Consolas', 'monospace'],
    },
    // A modest scale (ratio ≈ 1.2) with line heights fitted to each step.
    fontSize: {
      xs: ['0.8125rem', { lineHeight: '1.25rem' }],
      sm: ['0.9375rem', { lineHeight: '1.4rem' }],
      base: ['1.0625rem', { lineHeight: '1.65rem' }],
      lg: ['1.25rem', { lineHeight: '1.8rem' }],
      xl: ['1.5rem', { lineHeight: '2rem' }],
      '2xl': ['1.875rem', { lineHeight: '2.35rem' }],
      '3xl': ['2.375rem', { lineHeight: '2.8rem' }],
      '4xl': ['3rem', { lineHeight: '3.4rem' }],
    },
    borderRadius: {
      none: '0',
      sm: '2px',
      DEFAULT: '3px',
      md: '5px',
      lg: '8px',
      full: '9999px',
    },
    extend: {
      spacing: {
        gutter: '1.5rem',
        section: '3.5rem',
      },
      maxWidth: {
        measure: '68ch', // comfortable line length for prose
        page: '74rem',
      },
      letterSpacing: {
        label: '0.06em',
      },
      boxShadow: {
        sheet: '0 1px 0 #d6cdbb, 0 8px 24px -16px rgba(27, 29, 33, 0.25)',
      },
      outlineWidth: {
        focus: '3px',
      },
    },
  },
} satisfies Config;
