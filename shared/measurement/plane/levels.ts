/** The trade's reporting levels, % of a plane's peak: isolines, spread widths, areas. */
export const STANDARD_LEVELS_PCT = [80, 50, 25] as const;
