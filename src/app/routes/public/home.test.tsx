import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { aReportSummary, someKeyFigures } from '#src/test/public-report-fixtures.ts';
import { stubFetch } from '#src/test/fetch-stub.ts';
import { renderApp } from '#src/test/render-app.tsx';

describe('home page', () => {
  it('shows the latest reports, each with its coverage picture, summary, date and key figures', async () => {
    stubFetch({
      'GET /api/public/reports': {
        body: {
          reports: [
            aReportSummary('fenwick', { title: 'Fenwick torso panel', maker: 'Corvane Photonics', units: 2, keyFigures: someKeyFigures({ spread50CmAt15: 82.3 }) }),
            aReportSummary('tarn', {
              title: 'Tarn hand panel',
              version: 2,
              publishedAt: '2026-03-05T10:00:00.000Z',
              firstPublishedAt: '2026-03-01T10:00:00.000Z',
              keyFigures: someKeyFigures({ redSharePct: null }),
            }),
          ],
        },
      },
    });
    renderApp('/');
    const section = await screen.findByRole('region', { name: 'Latest reports' });
    const cards = await within(section).findAllByRole('article');
    expect(cards.map((c) => within(c).getByRole('heading', { level: 3 }).textContent)).toEqual(['Fenwick torso panel', 'Tarn hand panel']);
    expect(within(cards[0]).getByRole('link', { name: 'Fenwick torso panel' }).getAttribute('href')).toBe('/reports/fenwick');

    const picture = within(cards[0]).getByRole('img', { name: /Coverage picture for Corvane Photonics fenwick/ });
    expect(picture.getAttribute('aria-label')).toContain('15 cm from the unit');
    expect(picture.getAttribute('aria-label')).toContain('the dashed outline is the emitting area, 30 cm × 20 cm');
    // Coloured cells of the interpolated map, and the emitting area outlined (dashed).
    expect(picture.querySelectorAll('g path').length).toBeGreaterThan(5);
    expect(picture.querySelector('rect[stroke-dasharray]')).toBeTruthy();

    expect(cards[0].textContent).toContain('What we found when we measured fenwick.');
    expect(cards[0].textContent).toContain('2 units');
    expect(cards[0].textContent).toContain('Published 1 Mar 2026');
    expect(cards[1].textContent).toContain('Version 2, corrected 5 Mar 2026');
    const figures = within(cards[0]).getAllByRole('definition').map((d) => d.textContent);
    expect(figures).toEqual(['80.0', '40.0', '82.3', '50.0 / 50.0']);
    expect(within(cards[1]).getAllByRole('definition').at(-1)?.textContent).toBe('— not measured');
    expect(screen.getByRole('link', { name: 'All 2 reports, as a table you can sort' }).getAttribute('href')).toBe('/reports');
    expect(within(screen.getByRole('main')).getByText(/not treatment advice/).textContent).toContain('Local regulations and licensed practice come first');
  });
});
