import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { aMaker, anInstrument, page } from '#src/test/catalog-fixtures.ts';
import { errorAnswer, meAnswer, people, stubFetch, type FetchCall } from '#src/test/fetch-stub.ts';
import { renderApp } from '#src/test/render-app.tsx';

const makers = [aMaker('mk-1', 'Aurelux', { modelCount: 3 }), aMaker('mk-2', 'Brightfold', { modelCount: 1 })];
const listCalls = (calls: FetchCall[], path: string) => calls.filter((c) => c.method === 'GET' && c.path === path);

function labApi(handlers: Parameters<typeof stubFetch>[0]) {
  return stubFetch({ 'GET /api/me': meAnswer(people.tester), ...handlers });
}

describe('catalogue page: the list state lives in the URL', () => {
  it('loads the table with the sort and page the URL gives, and sends them to the API', async () => {
    const { calls } = labApi({ 'GET /api/lab/makers': page(makers, { total: 60, page: 2 }) });
    renderApp('/lab/catalog?tab=makers&sort=modelCount&dir=desc&page=2&pageSize=25');

    const table = await screen.findByRole('table', { name: 'Makers' });
    expect(listCalls(calls, '/api/lab/makers').map((c) => c.query)).toEqual([
      { sort: 'modelCount', dir: 'desc', page: '2', pageSize: '25' },
    ]);
    const headers = within(table).getAllByRole('columnheader');
    expect(headers.find((h) => h.getAttribute('aria-sort'))?.textContent).toContain('Models');
    expect(headers.filter((h) => h.getAttribute('aria-sort')).map((h) => h.getAttribute('aria-sort'))).toEqual(['descending']);
    // Each row is headed by the maker's name.
    expect(within(table).getAllByRole('rowheader').map((c) => c.textContent)).toEqual(['Aurelux', 'Brightfold']);
    const pager = screen.getByRole('navigation', { name: 'Pages of makers' });
    expect(pager.textContent).toContain('Page 2 of 3');
    expect(pager.textContent).toContain('Showing 26–50 of 60 makers');
  });

  it('sorts by a column header (click, then Enter to reverse) through the URL, and refetches', async () => {
    const { calls } = labApi({ 'GET /api/lab/makers': page(makers, { total: 60 }) });
    const { user, router } = renderApp('/lab/catalog?tab=makers&page=2');
    const table = await screen.findByRole('table', { name: 'Makers' });

    await user.click(within(table).getByRole('button', { name: 'Models' }));
    // Counts sort largest first; any new sort starts again at page 1.
    expect(new URLSearchParams(router.state.location.search).get('sort')).toBe('modelCount');
    expect(new URLSearchParams(router.state.location.search).get('dir')).toBe('desc');
    expect(new URLSearchParams(router.state.location.search).get('page')).toBeNull();
    await waitFor(() => expect(listCalls(calls, '/api/lab/makers').at(-1)?.query).toMatchObject({ sort: 'modelCount', dir: 'desc', page: '1' }));
    // The table re-renders in a transition after the URL changes: wait for it rather than race it.
    await waitFor(() => expect(within(table).getByRole('columnheader', { name: /Models/ }).getAttribute('aria-sort')).toBe('descending'));

    const modelsHeader = within(table).getByRole('button', { name: 'Models' });
    modelsHeader.focus();
    await user.keyboard('{Enter}');
    expect(new URLSearchParams(router.state.location.search).get('dir')).toBeNull(); // asc is the default
    await waitFor(() => expect(listCalls(calls, '/api/lab/makers').at(-1)?.query).toMatchObject({ sort: 'modelCount', dir: 'asc' }));
    await waitFor(() => expect(within(table).getByRole('columnheader', { name: /Models/ }).getAttribute('aria-sort')).toBe('ascending'));
  });

  it('pages forward, and the back button brings the previous page back', async () => {
    const { calls } = labApi({ 'GET /api/lab/makers': page(makers, { total: 60 }) });
    const { user, router } = renderApp('/lab/catalog?tab=makers');
    await screen.findByRole('table', { name: 'Makers' });

    await user.click(screen.getByRole('button', { name: 'Next page' }));
    expect(router.state.location.search).toBe('?tab=makers&page=2');
    await waitFor(() => expect(listCalls(calls, '/api/lab/makers').at(-1)?.query.page).toBe('2'));
    await waitFor(() => expect(screen.getByRole('navigation', { name: 'Pages of makers' }).textContent).toContain('Page 2 of 3'));

    await router.navigate(-1);
    expect(router.state.location.search).toBe('?tab=makers');
    await waitFor(() => expect(screen.getByRole('navigation', { name: 'Pages of makers' }).textContent).toContain('Page 1 of 3'));
  });

  it('searches after a pause in typing, with one request for the whole word', async () => {
    const { calls } = labApi({
      'GET /api/lab/makers': page(makers),
    });
    const { user, router } = renderApp('/lab/catalog?tab=makers&page=3');
    await screen.findByRole('table', { name: 'Makers' });
    await user.type(screen.getByRole('searchbox', { name: 'Search makers' }), 'aure');

    await waitFor(() => expect(new URLSearchParams(router.state.location.search).get('q')).toBe('aure'));
    expect(new URLSearchParams(router.state.location.search).get('page')).toBeNull();
    await waitFor(() => expect(listCalls(calls, '/api/lab/makers').at(-1)?.query).toMatchObject({ q: 'aure', page: '1' }));
    expect(listCalls(calls, '/api/lab/makers').filter((c) => c.query.q !== undefined).map((c) => c.query.q)).toEqual(['aure']);
  });

  it('says when nothing matches and offers to clear the search', async () => {
    const { calls } = labApi({ 'GET /api/lab/makers': page([]) });
    const { user, router } = renderApp('/lab/catalog?tab=makers&q=zzz');
    expect(await screen.findByText('No makers match this search or filter.')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Clear search and filters' }));
    expect(router.state.location.search).toBe('?tab=makers');
    expect(await screen.findByText(/No makers in the catalogue yet/)).toBeTruthy();
    expect(listCalls(calls, '/api/lab/makers').at(-1)?.query.q).toBeUndefined();
  });

  it('keeps the tab in the URL; arrow keys move between tabs and Enter opens one', async () => {
    const { calls } = labApi({
      'GET /api/lab/instruments': page([anInstrument('in-1', 'Bench spectro')]),
      'GET /api/lab/models': page([]),
      'GET /api/lab/makers': page(makers),
    });
    const { user, router } = renderApp('/lab/catalog?tab=instruments');
    expect(await screen.findByRole('table', { name: 'Instruments' })).toBeTruthy();
    expect(screen.getByRole('tab', { name: 'Instruments' }).getAttribute('aria-selected')).toBe('true');
    expect(calls.some((c) => c.path === '/api/lab/makers')).toBe(false);

    screen.getByRole('tab', { name: 'Instruments' }).focus();
    await user.keyboard('{Home}');
    expect(document.activeElement).toBe(screen.getByRole('tab', { name: 'Makers' }));
    await user.keyboard('{ArrowRight}');
    expect(document.activeElement).toBe(screen.getByRole('tab', { name: 'Models' }));
    expect(router.state.location.search).toBe('?tab=instruments'); // moving is not choosing
    await user.keyboard('{Enter}');
    expect(router.state.location.search).toBe('?tab=models');
    expect(await screen.findByRole('table', { name: 'Models' })).toBeTruthy();
    expect(screen.getByRole('tabpanel', { name: 'Models' })).toBeTruthy();
  });

  it('filters models by maker and category through the URL', async () => {
    const { calls } = labApi({
      'GET /api/lab/models': page([]),
      'GET /api/lab/makers': page(makers),
    });
    const { user, router } = renderApp('/lab/catalog?tab=models');
    await screen.findByRole('table', { name: 'Models' });
    const makerFilter = screen.getByRole('combobox', { name: 'Maker' }) as HTMLSelectElement;
    await waitFor(() => expect(makerFilter.disabled).toBe(false));
    await user.selectOptions(makerFilter, 'mk-2');
    await user.selectOptions(screen.getByRole('combobox', { name: 'Category' }), 'mat');
    expect(router.state.location.search).toBe('?tab=models&makerId=mk-2&category=mat');
    await waitFor(() => expect(listCalls(calls, '/api/lab/models').at(-1)?.query).toMatchObject({ makerId: 'mk-2', category: 'mat' }));
    // The maker filter's own list asks for makers by name, as many as one page may hold.
    expect(listCalls(calls, '/api/lab/makers')[0]?.query).toEqual({ sort: 'name', dir: 'asc', page: '1', pageSize: '200' });
  });

  it('marks an instrument past its calibration due date in its row, in words', async () => {
    labApi({
      'GET /api/lab/instruments': page([
        anInstrument('in-1', 'Bench spectro'),
        anInstrument('in-2', 'Old meter', { kind: 'irradiance_meter', calibrationDueOn: '2024-01-15', calibrationOverdue: true }),
      ]),
    });
    renderApp('/lab/catalog?tab=instruments');
    const table = await screen.findByRole('table', { name: 'Instruments' });
    const rowOf = (name: string) => within(table).getByRole('rowheader', { name }).closest('tr') as HTMLElement;
    expect(within(rowOf('Old meter')).getByText('Calibration overdue')).toBeTruthy();
    expect(within(rowOf('Old meter')).getByText('15 Jan 2024')).toBeTruthy();
    expect(within(rowOf('Bench spectro')).queryByText('Calibration overdue')).toBeNull();
  });

  it('shows a failed list with a way to try again', async () => {
    let fail = true;
    labApi({ 'GET /api/lab/makers': () => (fail ? errorAnswer(500, 'internal', 'The server failed.') : page(makers)) });
    const { user } = renderApp('/lab/catalog');
    expect(await screen.findByRole('heading', { name: 'The makers could not be loaded' })).toBeTruthy();
    fail = false;
    await user.click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByRole('table', { name: 'Makers' })).toBeTruthy();
  });
});
