/**
 * Preamble lines before the table: `key<delimiter>value` or `key: value`, possibly behind a
 * comment mark (`# Units: W/m2/nm`). The earliest separator wins, so `Date;2024-05-01 10:22`
 * keeps the time intact and `Comment: dark, averaged` keeps its comma.
 */
export interface MetadataEntry {
  key: string;
  value: string;
}

function unquote(text: string): string {
  const t = text.trim();
  return t.length >= 2 && t.startsWith('"') && t.endsWith('"') ? t.slice(1, -1).replace(/""/g, '"').trim() : t;
}

export function parseMetadataLine(line: string): MetadataEntry | null {
  const text = line.replace(/^\s*(#+|\/\/)\s*/, '');
  const match = /[:\t;,=]/.exec(text);
  if (!match) return null;
  const key = unquote(text.slice(0, match.index));
  // Spreadsheets pad short rows with delimiters: `Units;uW/cm2/nm;;`.
  const value = unquote(text.slice(match.index + 1).replace(/[\s;,\t]+$/, '').replace(/^[\s;,\t]+/, ''));
  if (key === '') return null;
  return { key, value };
}
