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
