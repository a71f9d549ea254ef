/**
 * Delimiter detection and field splitting for header detection, plus cell tests. The rows under
 * the header are split by csv-parse (table-records.ts).
 */
export type Delimiter = ',' | ';' | '\t' | ' ';

/** Tab, then semicolon, then comma, counted outside double quotes; whitespace as the last resort. */
export function detectDelimiter(line: string): Delimiter | null {
  let tabs = 0;
  let semicolons = 0;
  let commas = 0;
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const c = line.charCodeAt(i);
    if (c === 34) quoted = !quoted;
    else if (quoted) continue;
    else if (c === 9) tabs++;
    else if (c === 59) semicolons++;
    else if (c === 44) commas++;
  }
  if (tabs > 0) return '\t';
  if (semicolons > 0) return ';';
  if (commas > 0) return ',';
  return /\S\s+\S/.test(line) ? ' ' : null;
}

/** Splits one line; fields are trimmed and unquoted (`""` inside quotes stands for one quote). */
export function splitFields(line: string, delimiter: Delimiter): string[] {
  if (delimiter === ' ') return splitOnSpaces(line);
  if (!line.includes('"')) return line.split(delimiter).map((f) => f.trim());
  const fields: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (quoted) {
      if (ch === '"' && line[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === delimiter) {
      fields.push(field.trim());
      field = '';
    } else field += ch;
  }
  fields.push(field.trim());
  return fields;
}

/** True when a line holds nothing but delimiters and spaces (e.g. `;;;` left by a spreadsheet). */
export function isBlankLine(line: string): boolean {
  for (let i = 0; i < line.length; i++) {
    const c = line.charCodeAt(i);
    if (c !== 32 && c !== 9 && c !== 44 && c !== 59 && c !== 34) return false;
  }
  return true;
}

/** Spreadsheet formulas (`=SUM(…)`, `@A1`, `+A1`) must never be taken for values. */
export function looksLikeFormula(cell: string): boolean {
  const t = cell.trim().replace(/^"/, '');
  return /^[=@]/.test(t) || /^[+-][A-Za-z(]/.test(t);
}

/** Cells that mean "no value" in common exports. */
export function isMissingCell(cell: string): boolean {
  const t = cell.trim().replace(/^"|"$/g, '').trim().toLowerCase();
  return t === '' || t === 'nan' || t === 'na' || t === 'n/a' || t === '-' || t === '--' || t === 'null';
}

/**
 * Space-separated: `Wavelength (nm)` stays one field because a bracketed unit joins the word before
 * it. A line padded into aligned columns (runs of two or more spaces) is split on those runs only,
 * so `Wavelength (nm)    Spectral Irradiance (W/m^2/nm)` gives two fields.
 */
function splitOnSpaces(line: string): string[] {
  const text = line.trim();
  const fields: string[] = [];
  for (const part of text.split(/\s{2,}/.test(text) ? /\s{2,}/ : /\s+/)) {
    if (fields.length > 0 && /^[([]/.test(part)) fields[fields.length - 1] += ` ${part}`;
    else fields.push(part);
  }
  return fields;
}
