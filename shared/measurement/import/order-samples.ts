/**
 * Puts samples in ascending wavelength order and drops repeated wavelengths, keeping the first
 * occurrence in the file (the repeat is reported with its own line).
 */
import { ImportIssueList } from './import-issue-list.ts';

export interface OrderedSamples {
  wavelengthNm: Float64Array;
  values: Float64Array;
}

export function orderSamples(
  wavelengthNm: Float64Array,
  values: Float64Array,
  line: Int32Array,
  count: number,
  issues: ImportIssueList,
): OrderedSamples {
  let ascending = true;
  let descending = true;
  let nonDecreasing = true;
  let nonIncreasing = true;
  for (let i = 1; i < count; i++) {
    const d = wavelengthNm[i] - wavelengthNm[i - 1];
    if (d <= 0) ascending = false;
    if (d >= 0) descending = false;
    if (d < 0) nonDecreasing = false;
    if (d > 0) nonIncreasing = false;
  }
  if (ascending) return { wavelengthNm: wavelengthNm.slice(0, count), values: values.slice(0, count) };
  if (descending) {
    return { wavelengthNm: wavelengthNm.slice(0, count).reverse(), values: values.slice(0, count).reverse() };
  }
  if (!nonDecreasing && !nonIncreasing) {
    issues.add(null, 'unsorted_wavelengths', 'warning', 'The wavelengths are not in order; they were sorted.');
  }

  // Sorting by (wavelength, line) puts each repeat right after the first occurrence.
  const order = Array.from({ length: count }, (_, i) => i);
  order.sort((a, b) => wavelengthNm[a] - wavelengthNm[b] || line[a] - line[b]);
  const outWl = new Float64Array(count);
  const outValues = new Float64Array(count);
  let n = 0;
  let firstLine = 0;
  for (const k of order) {
    if (n > 0 && wavelengthNm[k] === outWl[n - 1]) {
      issues.add(
        line[k],
        'repeated_wavelength',
        'warning',
        `Line ${line[k]} repeats wavelength ${wavelengthNm[k]} nm already given on line ${firstLine}; the repeat was left out.`,
      );
      continue;
    }
    outWl[n] = wavelengthNm[k];
    outValues[n] = values[k];
    firstLine = line[k];
    n++;
  }
  return { wavelengthNm: outWl.slice(0, n), values: outValues.slice(0, n) };
}
