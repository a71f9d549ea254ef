import { palette } from '#src/styles/palette.ts';

/** Colours the chart library needs as literal values, taken from the one palette. */
export const DATA_COLORS = {
  ink: palette.ink.DEFAULT,
  inkMuted: palette.ink.muted,
  rule: palette.rule.DEFAULT,
  paper: palette.paper.raised,
  signal: palette.signal.DEFAULT,
  ember: palette.ember,
  infra: palette.infra,
} as const;
