import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorAnswer, meAnswer, people, stubFetch } from '#src/test/fetch-stub.ts';
import { renderApp } from '#src/test/render-app.tsx';
import { FIXTURE_SLUG, reportFixture } from '#src/test/report-fixture.ts';

const latestPath = `/api/public/reports/${FIXTURE_SLUG}`;
/** The first render loads the route modules and analyses the maps: more than findBy's default second. */
const SLOW = { timeout: 10_000 };

function sectionByHeading(name: string): HTMLElement {
  const heading = screen.getByRole('heading', { level: 2, name });
  const section = heading.closest('section');
  if (!section) throw new Error(`no section around ${name}`);
  return section;
}

function mapDescription(): string {
  const figure = screen.getByRole('img', { name: /Coverage over the body at/ });
  return figure.querySelector('desc')?.textContent ?? '';
}

/** The covered share of a zone at a level, as the table prints it. */
function zoneShare(zone: string, column: number): string {
  const table = screen.getByRole('table', { name: /Covered share of each body zone/ });
  const row = within(table).getByRole('rowheader', { name: zone }).closest('tr')!;
  return within(row).getAllByRole('cell')[column].textContent ?? '';
}

describe('public report page', { timeout: 30_000 }, () => {
  it('renders every section in order, with the figures of the report', async () => {
    stubFetch({ [`GET ${latestPath}`]: { body: { report: reportFixture() } } });
    renderApp(`/reports/${FIXTURE_SLUG}`);
    expect((await screen.findByRole('heading', { level: 1 }, SLOW)).textContent).toBe('Lumen test panel: even light at 30 cm');
    const h2 = screen.getAllByRole('heading', { level: 2 }).map((h) => h.textContent);
    const order = [
      'Key figures',
      'Write-up',
      'The unit and how it was measured',
      'Claims against measurements',
      'Coverage per distance',
      'Profile and falloff',
      'The spectrum',
      'Dose table',
      'Safety and certainty',
      'Unit-to-unit spread',
      'History and data',
    ];
    expect(h2.filter((t) => order.includes(t ?? ''))).toEqual(order);
    // The session planner, loaded on demand, sits after the dose table and is in the contents.
    const planner = await screen.findByRole('heading', { level: 2, name: 'Session planner' }, SLOW);
    const doseHeading = screen.getByRole('heading', { level: 2, name: 'Dose table' });
    expect(doseHeading.compareDocumentPosition(planner) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    expect(within(screen.getByRole('navigation', { name: 'On this page' })).getByRole('link', { name: 'Session planner' }).getAttribute('href')).toBe('#planner');
    // The write-up's own h2 sits one level down.
    expect(screen.getByRole('heading', { level: 3, name: 'What we tested' })).toBeTruthy();

    const unit = sectionByHeading('The unit and how it was measured');
    expect(unit.textContent).toContain('Fixture Optics');
    expect(unit.textContent).toContain('± 4 %');
    expect(unit.textContent).toContain('not a standard');
    expect(within(unit).getByRole('link', { name: 'the methodology' }).getAttribute('href')).toBe('/methodology');
    for (const serial of ['FX-0001', 'FX-0002']) expect(within(unit).getByRole('rowheader', { name: serial })).toBeTruthy();

    const claims = within(sectionByHeading('Claims against measurements')).getByRole('table');
    const beam = within(claims).getByRole('rowheader', { name: /Beam angle/ }).closest('tr')!;
    expect(beam.textContent).toContain('60° (stated as a full angle)');
    expect(beam.textContent).toContain('effective, fitted from the profiles and the falloff');
    const irradiance = within(claims).getByRole('rowheader', { name: 'Irradiance at the centre' }).closest('tr')!;
    // 80 ÷ 100 mW/cm² at 15 cm (the fixture's bell).
    expect(irradiance.textContent).toContain('80.0 mW/cm² at 15 cm');
    expect(within(irradiance).getAllByRole('cell').at(-1)?.textContent).toBe('0.800');

    // Dose: 4 J/cm² at the 80 mW/cm² centre takes 50 s = 0.8 min; at the 40 mW/cm² isoline 100 s = 1.7 min (computed).
    const dose = sectionByHeading('Dose table');
    const row15 = within(dose).getByRole('rowheader', { name: /^15 cm/ }).closest('tr')!;
    const cells = within(row15).getAllByRole('cell').map((c) => c.textContent);
    expect(cells.slice(0, 2)).toEqual(['0.8', '1.7']);
    expect(row15.querySelector('th')?.textContent).toBe('15 cm80.0 mW/cm² / 40.0 mW/cm²');
    expect(dose.textContent).toContain('not treatment advice');
    expect(within(dose).getByRole('heading', { name: 'Cautions for these times' })).toBeTruthy();

    const safety = sectionByHeading('Safety and certainty');
    expect(safety.textContent).toContain('expanded relative uncertainty');
    expect(within(safety).getByRole('table', { name: /Uncertainty budget/ })).toBeTruthy();
    expect(safety.textContent).toContain('not a risk-group classification');
    expect(safety.textContent).toContain('The instrument may under-read');

    const spread = sectionByHeading('Unit-to-unit spread');
    expect(within(spread).getByRole('rowheader', { name: 'Centre irradiance at 15 cm' })).toBeTruthy();

    // The charts load lazily and carry their own tables.
    expect(await screen.findByText(/Lateral profile along the centre row/, {}, SLOW)).toBeTruthy();
    expect(await screen.findByRole('table', { name: 'Emission peaks' }, SLOW)).toBeTruthy();
    expect(screen.getByRole('rowheader', { name: '660 nm' })).toBeTruthy();
  });

  it('redraws the map when the reader picks another distance', async () => {
    stubFetch({ [`GET ${latestPath}`]: { body: { report: reportFixture() } } });
    const { user } = renderApp(`/reports/${FIXTURE_SLUG}`);
    await screen.findByRole('heading', { level: 1 }, SLOW);
    expect(mapDescription()).toContain('Coverage map at 30 cm');
    // The fixture's centre at 30 cm is its peak, 60 mW/cm².
    expect(mapDescription()).toContain('Peak 60.0 mW/cm²');
    const chestRow = () => screen.getByRole('rowheader', { name: 'Chest' }).closest('tr')?.textContent;
    const before = chestRow();
    const distance = screen.getByRole('group', { name: 'Distance from the emitting surface' });
    await user.click(within(distance).getByRole('radio', { name: '60 cm' }));
    expect(mapDescription()).toContain('Coverage map at 60 cm');
    expect(mapDescription()).toContain('Peak 35.0 mW/cm²');
    expect(screen.getByRole('table', { name: /Covered share of each body zone at 60 cm/ })).toBeTruthy();
    expect(chestRow()).not.toBe(before);
  });

  it('changes the covered shares of the body zones when the body changes', async () => {
    stubFetch({ [`GET ${latestPath}`]: { body: { report: reportFixture() } } });
    const { user } = renderApp(`/reports/${FIXTURE_SLUG}`);
    await screen.findByRole('heading', { level: 1 }, SLOW);
    const chestMedium = zoneShare('Chest', 1);
    const areaMedium = zoneShare('Chest', 0);
    const size = screen.getByRole('group', { name: 'Body size' });
    await user.click(within(size).getByRole('radio', { name: 'Large adult' }));
    expect(zoneShare('Chest', 0)).not.toBe(areaMedium);
    expect(zoneShare('Chest', 1)).not.toBe(chestMedium);
    expect(mapDescription()).toContain('48 cm across the shoulders and 188 cm tall');

    // Custom sizes are typed, and wrong ones are refused in words while the figure keeps the last good body.
    await user.click(within(size).getByRole('radio', { name: 'Custom' }));
    const width = screen.getByRole('textbox', { name: 'Shoulder width (cm)' }) as HTMLInputElement;
    expect(width.value).toBe('48');
    await user.clear(width);
    await user.type(width, '90');
    expect(screen.getByText('Enter a shoulder width from 20 to 80 cm.')).toBeTruthy();
    expect(mapDescription()).toContain('48 cm across the shoulders');
    await user.clear(width);
    await user.type(width, '36');
    expect(mapDescription()).toContain('36 cm across the shoulders and 188 cm tall');

    // Moving the unit to face the thighs moves the light away from the chest.
    const placement = screen.getByRole('group', { name: "Unit's centre faces the" });
    await user.click(within(placement).getByRole('radio', { name: 'Thighs' }));
    expect(zoneShare('Chest', 3)).toBe('0 %');
  });

  it('converts figures when the reader changes units', async () => {
    stubFetch({ [`GET ${latestPath}`]: { body: { report: reportFixture() } } });
    const { user } = renderApp(`/reports/${FIXTURE_SLUG}`);
    await screen.findByRole('heading', { level: 1 }, SLOW);
    await user.click(within(screen.getByRole('group', { name: 'Irradiance in' })).getByRole('radio', { name: 'W/m²' }));
    await user.click(within(screen.getByRole('group', { name: 'Lengths in' })).getByRole('radio', { name: 'inches' }));
    // 60 mW/cm² = 600 W/m²; 30 cm = 11.8 in (1 mW/cm² = 10 W/m², 1 in = 2.54 cm, computed).
    expect(mapDescription()).toContain('Coverage map at 11.8 in');
    expect(mapDescription()).toContain('Peak 600 W/m²');
    const dose = sectionByHeading('Dose table');
    expect(within(dose).getByRole('rowheader', { name: /^5\.9 in/ }).textContent).toBe('5.9 in800 W/m² / 400 W/m²');
    const claims = within(sectionByHeading('Claims against measurements')).getByRole('table');
    expect(within(claims).getByRole('rowheader', { name: 'Irradiance at the centre' }).closest('tr')!.textContent).toContain('800 W/m² at 5.9 in');
    // Typed sizes follow the unit: a 42 cm medium body becomes 16.5 in.
    await user.click(within(screen.getByRole('group', { name: 'Body size' })).getByRole('radio', { name: 'Custom' }));
    expect((screen.getByRole('textbox', { name: 'Shoulder width (in)' }) as HTMLInputElement).value).toBe('16.5');
  });

  it('says in the unit section who paid for the test: readers, with how many and how much, or the lab', async () => {
    stubFetch({ [`GET ${latestPath}`]: { body: { report: reportFixture({ funding: { kind: 'readers', readers: 12, amounts: [{ amountMinor: 52999, currency: 'EUR' }] } }) } } });
    renderApp(`/reports/${FIXTURE_SLUG}`);
    await screen.findByRole('heading', { level: 2, name: 'The unit and how it was measured' }, SLOW);
    const unit = sectionByHeading('The unit and how it was measured');
    const term = within(unit).getByText('Who paid for the test');
    expect(term.nextElementSibling?.textContent).toBe('Funded by 12 readers (€529.99). Who pays for our tests');
    expect(within(unit).getByRole('link', { name: 'Who pays for our tests' }).getAttribute('href')).toBe('/independence');
  });

  it('says "Bought by the lab" when no reader paid toward it', async () => {
    stubFetch({ [`GET ${latestPath}`]: { body: { report: reportFixture() } } });
    renderApp(`/reports/${FIXTURE_SLUG}`);
    await screen.findByRole('heading', { level: 2, name: 'The unit and how it was measured' }, SLOW);
    expect(within(sectionByHeading('The unit and how it was measured')).getByText('Who paid for the test').nextElementSibling?.textContent).toBe('Bought by the lab. Who pays for our tests');
  });

  it('keeps a retracted report readable under a banner with the date and the reason', async () => {
    stubFetch({
      [`GET ${latestPath}`]: {
        body: { report: reportFixture({ retracted: { at: '2026-11-20T10:00:00.000Z', reason: 'Measured with the wrong diffuser fitted.' } }) },
      },
    });
    renderApp(`/reports/${FIXTURE_SLUG}`);
    const banner = (await screen.findByRole('heading', { level: 2, name: 'Retracted on 20 Nov 2026' }, SLOW)).closest('section')!;
    expect(banner.textContent).toContain('Measured with the wrong diffuser fitted.');
    // The page stays: the figures are still there.
    expect(screen.getByRole('heading', { level: 2, name: 'Coverage per distance' })).toBeTruthy();
  });

  it('shows a correction with its note and links every version to its own address', async () => {
    const v2 = reportFixture({ versions: 2 });
    const v1 = reportFixture({ versions: 2, version: 1 });
    stubFetch({
      [`GET ${latestPath}`]: { body: { report: v2 } },
      [`GET ${latestPath}/versions/1`]: { body: { report: v1 } },
    });
    const { user } = renderApp(`/reports/${FIXTURE_SLUG}`);
    expect(await screen.findByText('Version 2 of 2', {}, SLOW)).toBeTruthy();
    const correction = screen.getByText('Corrected:').closest('p');
    expect(correction?.textContent).toBe('Corrected: Corrected the claim comparison (version 2).');
    expect(correction?.nextElementSibling?.textContent).toContain('version 1 (10 Nov 2026)');
    const history = sectionByHeading('History and data');
    const links = within(history)
      .getAllByRole('link', { name: /^Version \d$/ })
      .map((a) => [a.textContent, a.getAttribute('href'), a.getAttribute('aria-current')]);
    expect(links).toEqual([
      ['Version 2', `/reports/${FIXTURE_SLUG}/versions/2`, 'page'],
      ['Version 1', `/reports/${FIXTURE_SLUG}/versions/1`, null],
    ]);
    expect(within(history).getByRole('link', { name: 'Readings of version 2 (CSV)' }).getAttribute('href')).toBe(
      `/api/public/reports/${FIXTURE_SLUG}/versions/2/readings.csv`,
    );
    expect(within(history).getByRole('link', { name: 'Figures (JSON)' }).getAttribute('href')).toBe(`/api/public/reports/${FIXTURE_SLUG}/figures.json`);

    await user.click(within(history).getByRole('link', { name: 'Version 1' }));
    expect(await screen.findByText('Version 1 of 2', {}, SLOW)).toBeTruthy();
    expect(screen.getByRole('link', { name: 'read the latest version (2)' }).getAttribute('href')).toBe(`/reports/${FIXTURE_SLUG}`);
  });

  it('says plainly when nothing is published at the address', async () => {
    stubFetch({ [`GET /api/public/reports/no-such-report`]: errorAnswer(404, 'not_found', 'That report was not found.') });
    renderApp('/reports/no-such-report');
    expect((await screen.findByRole('heading', { level: 1 }, SLOW)).textContent).toBe('No published report here');
    expect(screen.getByRole('link', { name: 'See every published report' }).getAttribute('href')).toBe('/reports');
  });
});

describe('staff preview of a report', { timeout: 30_000 }, () => {
  it('draws the same report view under a "not published" banner, for an editor', async () => {
    const { calls } = stubFetch({
      'GET /api/me': meAnswer(people.editor),
      'GET /api/lab/reports/rep-1/preview': { body: { report: reportFixture({ preview: true }) } },
    });
    renderApp('/lab/reports/rep-1/preview');
    expect(await screen.findByText('Preview — not published', {}, SLOW)).toBeTruthy();
    expect(screen.getByRole('heading', { level: 1 }).textContent).toBe('Lumen test panel: even light at 30 cm');
    expect(screen.getByRole('heading', { level: 2, name: 'Coverage per distance' })).toBeTruthy();
    expect(screen.getByText('The citation is given once the report is published.')).toBeTruthy();
    expect(screen.getByText('Version 1 (this preview, not published)')).toBeTruthy();
    await waitFor(() => expect(calls.filter((c) => c.path === '/api/lab/reports/rep-1/preview').length).toBeGreaterThan(0));
  });

  it('refuses a tester without asking for the preview', async () => {
    const { calls } = stubFetch({
      'GET /api/me': meAnswer(people.tester),
    });
    renderApp('/lab/reports/rep-1/preview');
    expect((await screen.findByRole('heading', { level: 1 }, SLOW)).textContent).toBe('Not allowed');
    expect(calls.some((c) => c.path.endsWith('/preview'))).toBe(false);
  });
});
