/**
 * Colours the chart library needs as literal values. They are the palette of tailwind.config.ts
 * (which exports none at run time); keep the two in step.
 */
export const DATA_COLOURS = {
  ink: '#1b1d21',
  inkMuted: '#595e66',
  rule: '#d6cdbb',
  paper: '#fcfaf5',
  signal: '#0f5c63',
  ember: '#a8321e',
  infra: '#5e3a73',
} as const;
