import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { aReportSummary, someKeyFigures } from '#src/test/public-report-fixtures.ts';
import { stubFetch } from '#src/test/fetch-stub.ts';
import { renderApp } from '#src/test/render-app.tsx';

const reports = [
  aReportSummary('fenwick', { title: 'Fenwick torso panel', maker: 'Corvane Photonics', publishedAt: '2026-03-03T10:00:00.000Z', keyFigures: someKeyFigures({ spread50CmAt15: 82 }) }),
  aReportSummary('mere', { title: 'Mere wrap mat', category: 'mat', maker: 'Quenby Therapeutics', publishedAt: '2026-03-02T10:00:00.000Z', keyFigures: someKeyFigures({ spread50CmAt15: 95 }) }),
  aReportSummary('tarn', { title: 'Tarn hand panel', maker: 'Aldermoor Light Co.', publishedAt: '2026-03-01T10:00:00.000Z', keyFigures: someKeyFigures({ spread50CmAt15: 30, measuredOverClaimed: null, pricePer100Cm2At30: null }) }),
  aReportSummary('holt', { title: 'Holt half-body panel', maker: 'Norrow & Vale', publishedAt: '2026-02-27T10:00:00.000Z', keyFigures: someKeyFigures({ spread50CmAt15: null }) }),
];

const search = (router: { state: { location: { search: string } } }) => new URLSearchParams(router.state.location.search);
const titles = (table: HTMLElement) => within(table).getAllByRole('rowheader').map((c) => c.querySelector('a')?.textContent);

describe('reports index', () => {
  it('lists the newest first, each title linking to its report, with the columns explained', async () => {
    stubFetch({ 'GET /api/public/reports': { body: { reports } } });
    renderApp('/reports');
    const table = await screen.findByRole('table', { name: /Published reports/ });
    expect(titles(table)).toEqual(['Fenwick torso panel', 'Mere wrap mat', 'Tarn hand panel', 'Holt half-body panel']);
    expect(within(table).getByRole('link', { name: 'Tarn hand panel' }).getAttribute('href')).toBe('/reports/tarn');
    expect(within(table).getByRole('columnheader', { name: /Report date/ }).getAttribute('aria-sort')).toBe('descending');
    // An empty cell says why it is empty.
    const tarn = within(table).getByRole('rowheader', { name: /Tarn hand panel/ }).closest('tr')!;
    expect(tarn.textContent).toContain('no claim');
    expect(tarn.textContent).toContain('no price');
    const holt = within(table).getByRole('rowheader', { name: /Holt/ }).closest('tr')!;
    expect(holt.textContent).toContain('not measured');
    expect(screen.getByRole('heading', { name: 'About the columns' })).toBeTruthy();
    expect(document.title).toBe('Reports · Benchlight');
  });

  it('sorts by the 50 % spread width (largest first, then reversed), empty cells last, with the sort in the URL', async () => {
    stubFetch({ 'GET /api/public/reports': { body: { reports } } });
    const { user, router } = renderApp('/reports');
    const table = await screen.findByRole('table', { name: /Published reports/ });

    await user.click(within(table).getByRole('button', { name: '50 % spread, 15 cm, cm' }));
    expect(search(router).get('sort')).toBe('spread50');
    expect(search(router).get('dir')).toBeNull(); // descending is the default
    await waitFor(() => expect(titles(table)).toEqual(['Mere wrap mat', 'Fenwick torso panel', 'Tarn hand panel', 'Holt half-body panel']));
    expect(within(table).getByRole('columnheader', { name: /50 % spread/ }).getAttribute('aria-sort')).toBe('descending');

    await user.click(within(table).getByRole('button', { name: '50 % spread, 15 cm, cm' }));
    expect(search(router).get('dir')).toBe('asc');
    await waitFor(() => expect(titles(table)).toEqual(['Tarn hand panel', 'Fenwick torso panel', 'Mere wrap mat', 'Holt half-body panel']));
    expect(screen.getByText('4 of 4 reports, sorted by 50 % spread at 15 cm (cm) (ascending).')).toBeTruthy();
  });

  it('filters to panels through the URL, and reads a shared address back as it was', async () => {
    stubFetch({ 'GET /api/public/reports': { body: { reports } } });
    const { user, router } = renderApp('/reports?sort=spread50&dir=asc');
    const table = await screen.findByRole('table', { name: /Published reports/ });
    expect(titles(table)).toEqual(['Tarn hand panel', 'Fenwick torso panel', 'Mere wrap mat', 'Holt half-body panel']);

    await user.selectOptions(screen.getByRole('combobox', { name: 'Category' }), 'panel');
    expect(search(router).get('category')).toBe('panel');
    expect(search(router).get('sort')).toBe('spread50');
    await waitFor(() => expect(titles(table)).toEqual(['Tarn hand panel', 'Fenwick torso panel', 'Holt half-body panel']));
    expect(screen.getByText(/3 of 4 reports, sorted by 50 % spread at 15 cm \(cm\) \(ascending\)/)).toBeTruthy();

    await user.selectOptions(screen.getByRole('combobox', { name: 'Maker' }), 'Corvane Photonics');
    expect(search(router).get('maker')).toBe('Corvane Photonics');
    await waitFor(() => expect(titles(table)).toEqual(['Fenwick torso panel']));

    await router.navigate(-1);
    await waitFor(() => expect(titles(table)).toEqual(['Tarn hand panel', 'Fenwick torso panel', 'Holt half-body panel']));
  });

  it('searches title, maker and model, and offers to clear a search that finds nothing', async () => {
    stubFetch({ 'GET /api/public/reports': { body: { reports } } });
    const { user, router } = renderApp('/reports?category=mat&q=fenwick');
    expect(await screen.findByText('No reports match this search or filter.')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Clear search and filters' }));
    expect(search(router).toString()).toBe('');
    const table = screen.getByRole('table', { name: /Published reports/ });
    await waitFor(() => expect(titles(table)).toHaveLength(4));

    await user.type(screen.getByRole('searchbox', { name: 'Search reports' }), 'quenby{Enter}');
    expect(search(router).get('q')).toBe('quenby');
    await waitFor(() => expect(titles(table)).toEqual(['Mere wrap mat']));
  });

  it('shows irradiance in W/m² and lengths in inches when the reader chooses them', async () => {
    stubFetch({ 'GET /api/public/reports': { body: { reports: [reports[0]] } } });
    const { user } = renderApp('/reports');
    const table = await screen.findByRole('table', { name: /Published reports/ });
    const row = () => within(table).getByRole('rowheader', { name: /Fenwick/ }).closest('tr')!;
    expect(within(table).getByRole('columnheader', { name: 'Centre, 15 cm, mW/cm²' })).toBeTruthy();
    expect(within(row()).getAllByRole('cell').map((c) => c.textContent)).toContain('80.0');

    await user.click(screen.getByRole('radio', { name: 'W/m²' }));
    await user.click(screen.getByRole('radio', { name: 'inches' }));
    // 80 mW/cm² = 800 W/m² (1 mW/cm² = 10 W/m², SI prefixes); 82 cm = 32.3 in (1 in = 2.54 cm exactly).
    expect(within(table).getByRole('columnheader', { name: 'Centre, 5.9 in, W/m²' })).toBeTruthy();
    const cells = within(row()).getAllByRole('cell').map((c) => c.textContent);
    expect(cells).toContain('800');
    expect(cells).toContain('32.3');
    // €35 per 100 cm² is €22.58 per 10 in² (64.516 cm²): computed.
    expect(cells).toContain('€22.58');
  });
});
