import { describe, expect, it } from 'vitest';
import { demoteHeadings } from './demote-headings.ts';

// Heading levels h1–h6 as HTML defines them (WHATWG HTML, "The h1–h6 elements").
describe('demoteHeadings', () => {
  it('moves headings down, keeping attributes and content', () => {
    expect(demoteHeadings('<h2>What we tested</h2><p>x</p><h3 id="a">Found</h3>', 1)).toBe(
      '<h3>What we tested</h3><p>x</p><h4 id="a">Found</h4>',
    );
  });

  it('stops at h6 and leaves other tags alone', () => {
    expect(demoteHeadings('<h5>a</h5><h6>b</h6><header>c</header><hr>', 2)).toBe('<h6>a</h6><h6>b</h6><header>c</header><hr>');
  });
});
