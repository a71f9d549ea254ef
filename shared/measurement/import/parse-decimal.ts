/**
 * Reads one number from a cell without allocating, for the importers' hot loop.
 * Accepts `12`, `-0.5`, `.5`, `1.`, `1.2E-03`, and with `decimalComma` also `0,5` / `1,2E-03`.
 * A minus may be the Unicode minus sign U+2212 (`−0.5`, `1E−03`), as some locales format numbers.
 * Surrounding spaces and one pair of double quotes are ignored. Anything else gives NaN
 * (including `NaN`, `Infinity`, hex, thousands separators and empty cells).
 *
 * Up to 15 significant digits and a power of ten within ±22 are computed as one exact integer
 * times (or divided by) one exact power of ten, which is correctly rounded (Clinger's fast path,
 * "How to read floating point numbers accurately", PLDI 1990); longer numbers go to Number().
 */
const POW10 = [
  1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16,
  1e17, 1e18, 1e19, 1e20, 1e21, 1e22,
];

function isBlank(code: number): boolean {
  return code === 32 || code === 9 || code === 0xa0;
}

function parseDecimal(s: string, start: number, end: number, decimalComma: boolean): number {
  while (start < end && isBlank(s.charCodeAt(start))) start++;
  while (end > start && isBlank(s.charCodeAt(end - 1))) end--;
  if (end - start >= 2 && s.charCodeAt(start) === 34 && s.charCodeAt(end - 1) === 34) {
    start++;
    end--;
    while (start < end && isBlank(s.charCodeAt(start))) start++;
    while (end > start && isBlank(s.charCodeAt(end - 1))) end--;
  }
  if (start >= end) return NaN;

  let i = start;
  let c = s.charCodeAt(i);
  let negative = false;
  if (c === 45 /* - */ || c === 0x2212 /* − */) {
    negative = true;
    i++;
  } else if (c === 43 /* + */) {
    i++;
  }
  let mantissa = 0;
  let significant = 0;
  let scale = 0;
  let sawDigit = false;
  let sawPoint = false;
  let exact = true;
  for (; i < end; i++) {
    c = s.charCodeAt(i);
    if (c >= 48 && c <= 57) {
      sawDigit = true;
      if (significant < 15) {
        if (mantissa !== 0 || c !== 48) significant++;
        mantissa = mantissa * 10 + (c - 48);
        if (sawPoint) scale--;
      } else {
        exact = false;
        if (!sawPoint) scale++;
      }
    } else if (!sawPoint && (c === 46 || (c === 44 && decimalComma))) {
      sawPoint = true;
    } else {
      break;
    }
  }
  if (!sawDigit) return NaN;
  if (i < end && (c === 101 || c === 69) /* e E */) {
    i++;
    let expNegative = false;
    c = s.charCodeAt(i);
    if (c === 45 || c === 0x2212) {
      expNegative = true;
      i++;
    } else if (c === 43) {
      i++;
    }
    let exponent = 0;
    let expDigits = 0;
    for (; i < end; i++) {
      c = s.charCodeAt(i);
      if (c < 48 || c > 57) break;
      if (exponent < 100000) exponent = exponent * 10 + (c - 48);
      expDigits++;
    }
    if (expDigits === 0) return NaN;
    scale += expNegative ? -exponent : exponent;
  }
  if (i !== end) return NaN;

  if (exact && scale >= -22 && scale <= 22) {
    const magnitude = scale < 0 ? mantissa / POW10[-scale] : mantissa * POW10[scale];
    return negative ? -magnitude : magnitude;
  }
  let text = s.slice(start, end).replace(/\u2212/g, '-');
  if (decimalComma) text = text.replace(',', '.');
  const value = Number(text);
  return Number.isFinite(value) ? value : NaN;
}

export function parseDecimalCell(cell: string, decimalComma: boolean): number {
  return parseDecimal(cell, 0, cell.length, decimalComma);
}
