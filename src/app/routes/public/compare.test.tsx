import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { aPublicReport, aReportSummary, someKeyFigures } from '#src/test/public-report-fixtures.ts';
import { errorAnswer, stubFetch } from '#src/test/fetch-stub.ts';
import { renderApp } from '#src/test/render-app.tsx';

const list = {
  body: {
    reports: [
      aReportSummary('fenwick', { title: 'Fenwick torso panel' }),
      aReportSummary('tarn', { title: 'Tarn hand panel' }),
      aReportSummary('holt', { title: 'Holt half-body panel' }),
    ],
  },
};
const fenwick = aPublicReport('fenwick', { title: 'Fenwick torso panel', peakAt15: 80, widthCm: 20, keyFigures: { measuredOverClaimed: null } });
const tarn = aPublicReport('tarn', { title: 'Tarn hand panel', peakAt15: 50, widthCm: 10, keyFigures: someKeyFigures({ centerMwCm2At30: 22.5 }) });
const holt = aPublicReport('holt', { title: 'Holt half-body panel', peakAt15: 65 });

function api(extra: Parameters<typeof stubFetch>[0] = {}) {
  return stubFetch({
    'GET /api/public/reports': list,
    'GET /api/public/reports/fenwick': { body: { report: fenwick } },
    'GET /api/public/reports/tarn': { body: { report: tarn } },
    'GET /api/public/reports/holt': { body: { report: holt } },
    ...extra,
  });
}

const search = (router: { state: { location: { search: string } } }) => new URLSearchParams(router.state.location.search);

describe('compare', () => {
  it('reads the reports from the URL and sets their key figures side by side in one table', async () => {
    const { calls } = api();
    renderApp('/compare?r=fenwick&r=tarn');
    const table = await screen.findByRole('table', { name: /Key figures side by side/ });
    const heads = within(table).getAllByRole('columnheader').map((h) => h.textContent?.replace(/^[●■▲◆]\s*/, ''));
    expect(heads).toEqual(['Figure', 'Fenwick torso panel', 'Tarn hand panel']);
    expect(within(table).getByRole('link', { name: 'Tarn hand panel' }).getAttribute('href')).toBe('/reports/tarn');
    const row = (name: RegExp) => within(within(table).getByRole('rowheader', { name }).closest('tr')!).getAllByRole('cell').map((c) => c.textContent);
    expect(row(/^Centre at 30 cm/)).toEqual(['40.0', '22.5']);
    expect(row(/^Measured ÷ claimed/)).toEqual(['— no claim', '0.600']);
    expect(calls.filter((c) => c.path.startsWith('/api/public/reports/')).map((c) => c.path).sort()).toEqual([
      '/api/public/reports/fenwick',
      '/api/public/reports/tarn',
    ]);
    // 30 cm is measured by both, so it is the distance shown first.
    expect((screen.getByRole('radio', { name: '30 cm' }) as HTMLInputElement).checked).toBe(true);
    expect(screen.getByRole('heading', { name: 'Coverage maps at 30 cm' })).toBeTruthy();
  });

  it('draws the maps on one colour scale and frame: the dimmer unit never reaches the darkest colour', async () => {
    api();
    renderApp('/compare?r=fenwick&r=tarn&d=15');
    await screen.findByRole('heading', { name: 'Coverage maps at 15 cm' });
    const maps = await screen.findAllByRole('img', { name: /^Coverage map of/ });
    expect(maps).toHaveLength(2);
    const fills = (svg: Element) => [...svg.querySelectorAll('g[shape-rendering="crispEdges"] path')].map((p) => p.getAttribute('fill'));
    // The ramp ends at #4b1d3f (coverage-colors.ts): only the brighter unit's peak gets it.
    expect(fills(maps[0])).toContain('#4b1d3f');
    expect(fills(maps[1])).not.toContain('#4b1d3f');
    expect(maps[0].getAttribute('viewBox')).toBe(maps[1].getAttribute('viewBox'));
    expect(screen.getByText(/one scale for every map below/)).toBeTruthy();
    // 50 mW/cm² is the dimmer peak at 15 cm; the shared scale tops out at the brighter 80.
    for (const map of maps) expect(map.querySelector('desc')?.textContent).toContain('Colours run from 0 to 80.0 mW/cm²');
  });

  it('compares at most four: a fifth report in the URL is left out, and the picker says why', async () => {
    const { calls } = api({
      'GET /api/public/reports/mere': { body: { report: aPublicReport('mere', { title: 'Mere wrap mat' }) } },
      'GET /api/public/reports/extra': { body: { report: aPublicReport('extra') } },
    });
    renderApp('/compare?r=fenwick&r=tarn&r=holt&r=mere&r=extra');
    const table = await screen.findByRole('table', { name: /Key figures side by side/ });
    expect(within(table).getAllByRole('columnheader')).toHaveLength(5);
    expect(calls.some((c) => c.path === '/api/public/reports/extra')).toBe(false);
    expect(screen.getByText(/Four reports is the most this page compares/)).toBeTruthy();
  });

  it('adds and removes reports through the URL', async () => {
    api();
    const { user, router } = renderApp('/compare?r=fenwick');
    expect(await screen.findByText(/Choose at least one more report/)).toBeTruthy();
    await user.selectOptions(await screen.findByRole('combobox', { name: 'Add a report' }), 'holt');
    await user.click(screen.getByRole('button', { name: 'Add to the comparison' }));
    expect(search(router).getAll('r')).toEqual(['fenwick', 'holt']);
    expect(await screen.findByRole('table', { name: /Key figures side by side/ })).toBeTruthy();

    await user.click(screen.getByRole('button', { name: 'Remove Fenwick torso panel' }));
    expect(search(router).getAll('r')).toEqual(['holt']);
    await waitFor(() => expect(screen.queryByRole('table', { name: /Key figures side by side/ })).toBeNull());
  });

  it('says which report in the URL is not published, and offers to remove it', async () => {
    api({ 'GET /api/public/reports/gone': errorAnswer(404, 'not_found', 'That report was not found.') });
    const { user, router } = renderApp('/compare?r=fenwick&r=gone&r=tarn');
    expect(await screen.findByText('“gone” cannot be compared')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Remove it from the comparison' }));
    expect(search(router).getAll('r')).toEqual(['fenwick', 'tarn']);
  });

  it('switches the distance through the URL', async () => {
    api();
    const { user, router } = renderApp('/compare?r=fenwick&r=tarn');
    await screen.findByRole('table', { name: /Key figures side by side/ });
    await user.click(screen.getByRole('radio', { name: '15 cm' }));
    expect(search(router).get('d')).toBe('15');
    expect(await screen.findByRole('heading', { name: 'Lateral profiles at 15 cm' })).toBeTruthy();
  });
});
