import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { aLabReport, anApprovedRun } from '#src/test/lab-report-fixtures.ts';
import { errorAnswer, meAnswer, people, stubFetch, type FetchCall } from '#src/test/fetch-stub.ts';
import { renderApp } from '#src/test/render-app.tsx';

const tarn = { id: 'md-tarn', name: 'Tarn hand panel', maker: 'Aldermoor Light Co.' };
const fenwick = { id: 'md-fen', name: 'Fenwick torso panel', maker: 'Corvane Photonics' };
const runs = [
  anApprovedRun('run-f1', 'CVP-00417', fenwick),
  anApprovedRun('run-f2', 'CVP-00452', fenwick),
  anApprovedRun('run-t1', 'ALM-2291', tarn),
];
const runsPage = { body: { items: runs, total: runs.length, page: 1, pageSize: 200 } };
const posts = (calls: FetchCall[]) => calls.filter((c) => c.method !== 'GET').map((c) => [c.method, c.path, c.body]);

describe('lab reports: list', () => {
  it('lists each report with its state, version, model and where to read it', async () => {
    stubFetch({
      'GET /api/me': meAnswer(people.editor),
      'GET /api/lab/reports': {
        body: {
          reports: [
            aLabReport('r-draft', { title: 'A draft', updatedAt: '2026-03-05T10:00:00.000Z' }),
            aLabReport('r-pub', { title: 'A corrected report', slug: 'corrected', status: 'published', version: 2, publishedAt: '2026-03-04T10:00:00.000Z', updatedAt: '2026-03-04T10:00:00.000Z' }),
            aLabReport('r-ret', { title: 'A retracted report', slug: 'gone', status: 'retracted', version: 1, publishedAt: '2026-03-01T10:00:00.000Z', retractedAt: '2026-03-02T10:00:00.000Z', retractionReason: 'Wrong unit.', updatedAt: '2026-03-02T10:00:00.000Z' }),
          ],
        },
      },
    });
    renderApp('/lab/reports');
    const table = await screen.findByRole('table', { name: 'Reports' });
    const row = (name: string) => within(table).getByRole('rowheader', { name }).closest('tr')!;
    expect(within(table).getAllByRole('rowheader').map((c) => c.textContent)).toEqual(['A draft', 'A corrected report', 'A retracted report']);
    expect(within(row('A draft')).getByRole('link', { name: 'Preview' }).getAttribute('href')).toBe('/lab/reports/r-draft/preview');
    expect(within(row('A draft')).queryByRole('link', { name: 'Public page' })).toBeNull();
    expect(row('A corrected report').textContent).toContain('Published');
    expect(within(row('A corrected report')).getAllByRole('cell')[1].textContent).toBe('2');
    expect(within(row('A corrected report')).getByRole('link', { name: 'Public page' }).getAttribute('href')).toBe('/reports/corrected');
    expect(row('A retracted report').textContent).toContain('retracted 2 Mar 2026');
    expect(within(table).getByRole('link', { name: 'A draft' }).getAttribute('href')).toBe('/lab/reports/r-draft');
    expect(screen.getByRole('link', { name: 'New report' }).getAttribute('href')).toBe('/lab/reports/new');
  });

  it('shows a tester the list without the editor’s steps, and refuses them the new-report page', async () => {
    stubFetch({ 'GET /api/me': meAnswer(people.tester), 'GET /api/lab/reports': { body: { reports: [aLabReport('r-draft')] } } });
    const { router } = renderApp('/lab/reports');
    const table = await screen.findByRole('table', { name: 'Reports' });
    expect(within(table).queryByRole('link', { name: 'Preview' })).toBeNull();
    expect(screen.queryByRole('link', { name: 'New report' })).toBeNull();
    await router.navigate('/lab/reports/new');
    expect(await screen.findByText(/cannot make reports/)).toBeTruthy();
  });
});

describe('lab reports: a new report', () => {
  it('groups the approved runs by model, posts the chosen runs with the text, and opens the new draft', async () => {
    const { calls } = stubFetch({
      'GET /api/me': meAnswer(people.editor),
      'GET /api/lab/runs': runsPage,
      'POST /api/lab/reports': (body) => ({ status: 201, body: { report: aLabReport('r-new', { ...(body as object), modelId: 'md-fen', runIds: (body as { runIds: string[] }).runIds }) } }),
      'GET /api/lab/reports/r-new': { body: { report: aLabReport('r-new', { title: 'Fenwick torso panel, two units' }) } },
    });
    const { user, router } = renderApp('/lab/reports/new');
    const fenwickGroup = await screen.findByRole('group', { name: 'Corvane Photonics Fenwick torso panel' });
    expect(within(fenwickGroup).getAllByRole('checkbox')).toHaveLength(2);
    expect(screen.getByRole('group', { name: 'Aldermoor Light Co. Tarn hand panel' })).toBeTruthy();
    expect(calls.find((c) => c.path === '/api/lab/runs')?.query).toMatchObject({ status: 'approved', pageSize: '200' });

    await user.click(within(fenwickGroup).getByRole('checkbox', { name: /Unit CVP-00417/ }));
    await user.click(within(fenwickGroup).getByRole('checkbox', { name: /Unit CVP-00452/ }));
    await user.type(screen.getByRole('textbox', { name: 'Title' }), 'Fenwick torso panel, two units');
    await user.type(screen.getByRole('textbox', { name: 'Summary' }), 'Two units measured a month apart agree within 4 %.');
    await user.type(screen.getByRole('textbox', { name: 'Write-up' }), '## Method{Enter}{Enter}The standard grid.');
    await user.click(screen.getByRole('button', { name: 'Create the draft' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/lab/reports/r-new'));
    expect(posts(calls)).toEqual([
      [
        'POST',
        '/api/lab/reports',
        { runIds: ['run-f1', 'run-f2'], title: 'Fenwick torso panel, two units', summary: 'Two units measured a month apart agree within 4 %.', bodyMarkdown: '## Method\n\nThe standard grid.' },
      ],
    ]);
    expect(await screen.findByText('Draft created. Nothing is public until you publish it.')).toBeTruthy();
  });

  it('says beside each field what is missing, and refuses runs of two models before sending', async () => {
    const { calls } = stubFetch({ 'GET /api/me': meAnswer(people.editor), 'GET /api/lab/runs': runsPage });
    const { user } = renderApp('/lab/reports/new');
    await screen.findByRole('group', { name: 'Approved runs' });
    await user.click(screen.getByRole('button', { name: 'Create the draft' }));
    expect(await screen.findByText('Choose at least one approved run.')).toBeTruthy();
    expect(screen.getByText('Give the report a title.')).toBeTruthy();
    expect(screen.getByText('Write a summary of a sentence or two.')).toBeTruthy();
    // The focus goes to the first field in error: the runs.
    expect(document.activeElement).toBe(screen.getByRole('checkbox', { name: /Unit ALM-2291/ }));

    await user.click(screen.getByRole('checkbox', { name: /Unit ALM-2291/ }));
    await user.click(screen.getByRole('checkbox', { name: /Unit CVP-00417/ }));
    await user.click(screen.getByRole('button', { name: 'Create the draft' }));
    expect(await screen.findByText('A report covers runs of one model only: choose runs from one group.')).toBeTruthy();
    expect(calls.some((c) => c.method === 'POST')).toBe(false);
  });

  it('shows the server’s message when a run is no longer approved (409)', async () => {
    stubFetch({
      'GET /api/me': meAnswer(people.editor),
      'GET /api/lab/runs': runsPage,
      'POST /api/lab/reports': errorAnswer(409, 'conflict', 'A report can be made only of approved runs; ALM-2291 (submitted) is not.', { runIds: ['run-t1'] }),
    });
    const { user, router } = renderApp('/lab/reports/new');
    await user.click(await screen.findByRole('checkbox', { name: /Unit ALM-2291/ }));
    await user.type(screen.getByRole('textbox', { name: 'Title' }), 'Tarn hand panel');
    await user.type(screen.getByRole('textbox', { name: 'Summary' }), 'A small panel, measured once.');
    await user.click(screen.getByRole('button', { name: 'Create the draft' }));
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('The report was not saved: A report can be made only of approved runs; ALM-2291 (submitted) is not.');
    expect(router.state.location.pathname).toBe('/lab/reports/new');
  });
});

describe('lab reports: publish, correct, retract', () => {
  it('saves a draft’s text, links to the preview, and publishes after a confirmation', async () => {
    const { calls } = stubFetch({
      'GET /api/me': meAnswer(people.editor),
      'GET /api/lab/reports/r-1': { body: { report: aLabReport('r-1') } },
      'PATCH /api/lab/reports/r-1': (body) => ({ body: { report: aLabReport('r-1', body as object) } }),
      'POST /api/lab/reports/r-1/publish': { body: { report: aLabReport('r-1', { status: 'published', version: 1, publishedAt: '2026-03-06T10:00:00.000Z' }) } },
    });
    const { user } = renderApp('/lab/reports/r-1');
    const title = await screen.findByRole('textbox', { name: 'Title' });
    await user.clear(title);
    await user.type(title, 'Tarn hand panel, measured');
    await user.click(screen.getByRole('button', { name: 'Save the draft' }));
    expect(await screen.findByText('Draft saved.')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Preview the page' }).getAttribute('href')).toBe('/lab/reports/r-1/preview');

    await user.click(screen.getByRole('button', { name: 'Publish…' }));
    expect(posts(calls).filter(([m]) => m === 'POST')).toEqual([]);
    expect(document.activeElement?.textContent).toContain('Publish version 1 of');
    await user.click(screen.getByRole('button', { name: /Publish now at \/reports\/aldermoor-light-co-tarn-hand-panel/ }));
    expect(await screen.findByText(/Published: version 1 is public at \/reports\/aldermoor-light-co-tarn-hand-panel/)).toBeTruthy();
    expect(posts(calls)).toEqual([
      ['PATCH', '/api/lab/reports/r-1', { title: 'Tarn hand panel, measured', summary: 'A small panel that delivers most of its light close in.', bodyMarkdown: '## What we found\n\nMost of the light falls on a small area.' }],
      ['POST', '/api/lab/reports/r-1/publish', {}],
    ]);
  });

  it('publishes a correction with its note, sending only what changed', async () => {
    const published = aLabReport('r-2', { status: 'published', version: 1, publishedAt: '2026-03-01T10:00:00.000Z' });
    const { calls } = stubFetch({
      'GET /api/me': meAnswer(people.editor),
      'GET /api/lab/reports/r-2': { body: { report: published } },
      'POST /api/lab/reports/r-2/corrections': (body) => ({ body: { report: { ...published, ...(body as object), version: 2 } } }),
    });
    const { user } = renderApp('/lab/reports/r-2');
    const section = await screen.findByRole('region', { name: 'Publish a correction' });
    await user.click(within(section).getByRole('button', { name: 'Publish version 2' }));
    expect(await within(section).findByText('Say what the correction changes.')).toBeTruthy();

    await user.type(within(section).getByRole('textbox', { name: 'Change note' }), 'The 30 cm plane was read with the wrong calibration file.');
    const summary = within(section).getByRole('textbox', { name: 'Summary' });
    await user.clear(summary);
    await user.type(summary, 'A small panel; the 30 cm figures are corrected.');
    await user.click(within(section).getByRole('button', { name: 'Publish version 2' }));
    expect(await screen.findByText(/Version 2 published with its change note/)).toBeTruthy();
    expect(posts(calls)).toEqual([
      ['POST', '/api/lab/reports/r-2/corrections', { changeNote: 'The 30 cm plane was read with the wrong calibration file.', summary: 'A small panel; the 30 cm figures are corrected.' }],
    ]);
  });

  it('retracts with a reason, only after the confirmation', async () => {
    const published = aLabReport('r-3', { status: 'published', version: 1, publishedAt: '2026-03-01T10:00:00.000Z' });
    const { calls } = stubFetch({
      'GET /api/me': meAnswer(people.editor),
      'GET /api/lab/reports/r-3': { body: { report: published } },
      'POST /api/lab/reports/r-3/retract': (body) => ({
        body: { report: { ...published, status: 'retracted', retractedAt: '2026-03-07T10:00:00.000Z', retractionReason: (body as { reason: string }).reason } },
      }),
    });
    const { user } = renderApp('/lab/reports/r-3');
    const section = await screen.findByRole('region', { name: 'Retract' });
    await user.type(within(section).getByRole('textbox', { name: 'Reason' }), 'Too short');
    await user.click(within(section).getByRole('button', { name: 'Retract…' }));
    expect(await within(section).findByText('Give the reason readers will see.')).toBeTruthy();

    await user.clear(within(section).getByRole('textbox', { name: 'Reason' }));
    await user.type(within(section).getByRole('textbox', { name: 'Reason' }), 'The unit tested was a pre-production sample.');
    await user.click(within(section).getByRole('button', { name: 'Retract…' }));
    expect((await within(section).findByRole('group')).textContent).toContain('The unit tested was a pre-production sample.');
    await user.click(within(section).getByRole('button', { name: 'Go back' }));
    expect(posts(calls)).toEqual([]);

    await user.click(within(section).getByRole('button', { name: 'Retract…' }));
    await user.click(await within(section).findByRole('button', { name: 'Yes, retract it' }));
    expect(await screen.findByText(/Retracted: the page now carries the banner/)).toBeTruthy();
    expect(posts(calls)).toEqual([['POST', '/api/lab/reports/r-3/retract', { reason: 'The unit tested was a pre-production sample.' }]]);
  });

  it('shows a tester where a report stands, without the editor’s steps', async () => {
    stubFetch({ 'GET /api/me': meAnswer(people.tester), 'GET /api/lab/reports/r-1': { body: { report: aLabReport('r-1') } } });
    renderApp('/lab/reports/r-1');
    expect(await screen.findByRole('heading', { name: 'Overview' })).toBeTruthy();
    expect(screen.getByText("Publishing, corrections and retractions are an editor's steps.")).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Publish…' })).toBeNull();
  });
});
