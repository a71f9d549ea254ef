import { describe, expect, it } from 'vitest';
import { figuresJsonUrl, parseVersionParam, readingsCsvUrl, reportPath } from './report-urls.ts';

// The public read-only API's paths as the server routes them (server/routes/public-routes.ts): no outside source applies.
describe('report addresses', () => {
  it('builds page and download paths for the latest and for one version', () => {
    expect(reportPath('tarn-hand-panel')).toBe('/reports/tarn-hand-panel');
    expect(reportPath('tarn-hand-panel', 2)).toBe('/reports/tarn-hand-panel/versions/2');
    expect(readingsCsvUrl('tarn-hand-panel', null)).toBe('/api/public/reports/tarn-hand-panel/readings.csv');
    expect(readingsCsvUrl('tarn-hand-panel', 1)).toBe('/api/public/reports/tarn-hand-panel/versions/1/readings.csv');
    expect(figuresJsonUrl('tarn-hand-panel')).toBe('/api/public/reports/tarn-hand-panel/figures.json');
    expect(figuresJsonUrl('tarn-hand-panel', 1)).toBe('/api/public/reports/tarn-hand-panel/versions/1/figures.json');
  });

  it('reads a version number only when it is a whole number from 1', () => {
    expect(parseVersionParam('2')).toBe(2);
    expect(parseVersionParam('12')).toBe(12);
    for (const bad of ['0', '-1', '1.5', 'two', '', '02', undefined]) expect(parseVersionParam(bad)).toBeNull();
  });
});
