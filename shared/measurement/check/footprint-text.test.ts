import { describe, expect, it } from 'vitest';
import { parseFootprintCm } from './footprint-text.ts';

describe('parseFootprintCm', () => {
  it('accepts x, X and ×, with decimals and spaces', () => {
    // W × H notation for sizes (common practice, no source).
    expect(parseFootprintCm('34x80')).toEqual({ widthCm: 34, heightCm: 80 });
    expect(parseFootprintCm('34X80')).toEqual({ widthCm: 34, heightCm: 80 });
    expect(parseFootprintCm('34×80')).toEqual({ widthCm: 34, heightCm: 80 });
    expect(parseFootprintCm(' 30.5 x 91.5 ')).toEqual({ widthCm: 30.5, heightCm: 91.5 });
  });

  it('refuses anything else', () => {
    for (const s of ['34', 'x80', '34x', '0x80', '-34x80', '34*80', '34x80x2']) expect(parseFootprintCm(s)).toBeNull();
  });
});
