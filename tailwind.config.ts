import type { Config } from 'tailwindcss';

/**
 * Benchlight's visual identity: a lab notebook rather than a dashboard.
 * Warm paper, deep ink, hairline rules, one measured accent ("signal", a deep teal) and two data
 * colours for the bands we measure (ember = red, infra = near-infrared).
 *
 * Contrast (WCAG 2.x, checked against paper #f6f2e9 / paper-raised #fcfaf5 / paper-sunk #ece6d8):
 *   ink 15.1 · ink-soft 9.4 · ink-muted 5.8 (5.2 on sunk) · signal 6.9 · danger 6.7 · ok 5.8 ·
 *   warn 6.1 · ember 6.0 · infra 8.1 · white on signal 7.7. Non-text: control borders 4.3,
 *   focus ring 4.5 (≥ 3 required).
 * The palette replaces Tailwind's defaults on purpose: only these names exist.
 */
export const palette = {
  transparent: 'transparent',
  current: 'currentColor',
  white: '#ffffff',
  ink: { DEFAULT: '#1b1d21', soft: '#3b4047', muted: '#595e66' },
  paper: { DEFAULT: '#f6f2e9', raised: '#fcfaf5', sunk: '#ece6d8' },
  rule: { DEFAULT: '#d6cdbb', strong: '#a89d86' },
  control: '#7a7263', // borders of inputs and selects (≥ 3:1 against paper)
  signal: { DEFAULT: '#0f5c63', strong: '#0a454b', tint: '#e2eeed' },
  focus: '#b5530a',
  ember: '#a8321e', // red band, data only
  infra: '#5e3a73', // near-infrared band, data only
  ok: { DEFAULT: '#2d6a3b', tint: '#e3efe2' },
  warn: { DEFAULT: '#7a5300', tint: '#f6ead0' },
  danger: { DEFAULT: '#a1261c', tint: '#f8e4df' },
};

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
