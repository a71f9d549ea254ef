import { DATA_COLORS } from '#src/components/figures/data-colors.ts';

/** One look per compared report, by position: colour and dash differ, so lines part without colour too. */
const COLORS = [DATA_COLORS.signal, DATA_COLORS.ember, DATA_COLORS.infra, DATA_COLORS.ink];
const DASHES = ['', '7 4', '2 3', '9 3 2 3'];
const MARKERS = ['●', '■', '▲', '◆'];

export function seriesStyle(index: number): { color: string; dash: string; marker: string } {
  return { color: COLORS[index % COLORS.length], dash: DASHES[index % DASHES.length], marker: MARKERS[index % MARKERS.length] };
}
