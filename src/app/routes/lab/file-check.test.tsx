import { screen, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { renderApp } from '#src/test/render-app.tsx';
import { meAnswer, people, stubFetch } from '#src/test/fetch-stub.ts';

// jsdom's File has no arrayBuffer(); the page uses it, so read the bytes the older way here.
beforeAll(() => {
  if (typeof File.prototype.arrayBuffer !== 'function') {
    File.prototype.arrayBuffer = function (this: Blob) {
      return new Promise<ArrayBuffer>((resolve, reject) => {
        const reader = new FileReader();
        reader.onload = () => resolve(reader.result as ArrayBuffer);
        reader.onerror = () => reject(reader.error);
        reader.readAsArrayBuffer(this);
      });
    };
  }
});

/** 550–750 nm every 10 nm at 1 W/m²/nm: red (600–700) = 100 W/m² = 10 mW/cm² (trapezoid, exact for a flat line). */
function flatSpectrum(header = 'Wavelength (nm),Irradiance (W/m2/nm)'): string {
  const rows = [header];
  for (let nm = 550; nm <= 750; nm += 10) rows.push(`${nm},1`);
  return rows.join('\n') + '\n';
}

/**
 * Two planes of 3 × 3 points, 10 cm apart. At 10 cm: centre 100, edges 60, corners 36 mW/cm²;
 * at 20 cm every value a quarter of that, so the falloff exponent is exactly 2.
 * Along y = 0 the 80 % level (80) is crossed at x = ±5 cm (linear between 60 and 100): width 10 cm;
 * the 50 % level is met by the whole row: at least 20 cm, reaching the edge of the grid.
 */
function meterFile(): string {
  const rows = ['distance_cm,x_cm,y_cm,irradiance_mw_cm2'];
  for (const [d, k] of [[10, 1], [20, 0.25]] as const)
    for (const y of [-10, 0, 10])
      for (const x of [-10, 0, 10]) {
        const v = 100 * (x === 0 ? 1 : 0.6) * (y === 0 ? 1 : 0.6) * k;
        rows.push(`${d},${x},${y},${v}`);
      }
  return rows.join('\n') + '\n';
}

/**
 * The page's module (with the measurement core) loads lazily, and reading, importing and mapping
 * follow the upload asynchronously: room for a loaded machine beyond the 1 s default.
 */
const slow = { timeout: 5000 };

function openPage() {
  stubFetch({ 'GET /api/me': meAnswer(people.tester) });
  return renderApp('/lab/check');
}

describe('file check page', () => {
  it('says files stay in the browser', async () => {
    openPage();
    expect((await screen.findByRole('heading', { level: 1 }, slow)).textContent).toBe('File check');
    expect(screen.getByText('Files are read in your browser; nothing is uploaded.')).toBeTruthy();
    expect(screen.getByRole('heading', { level: 2, name: 'Spectrum exports' })).toBeTruthy();
    expect(screen.getByRole('heading', { level: 2, name: 'Meter readings' })).toBeTruthy();
  });

  it('shows the unit, the band figures in mW/cm² and W/m², and the partial-band flag of a spectrum', async () => {
    const { user } = openPage();
    const input = await screen.findByLabelText('Spectrum files', {}, slow);
    await user.upload(input, new File([flatSpectrum()], 'flat.csv', { type: 'text/csv' }));

    const card = (await screen.findByRole('heading', { level: 3, name: /flat\.csv/ }, slow)).closest('section')!;
    expect(await within(card).findByText('Readable', {}, slow)).toBeTruthy();
    const figures = within(card).getByRole('table', { name: 'Figures for flat.csv' });
    const row = (label: string) => within(figures).getByRole('rowheader', { name: label }).closest('tr')!.textContent;
    expect(row('Unit in the file')).toContain('W/m²/nm');
    expect(row('Unit in the file')).toContain('as the file states');
    expect(row('Samples')).toContain('21');
    expect(row('Wavelength range')).toContain('550–750 nm');
    expect(row('Red (600–700 nm)')).toContain('10.0 mW/cm²');
    expect(row('Red (600–700 nm)')).toContain('(100 W/m²)');
    // The file stops at 750 nm: only 700–750 nm of the near-infrared band is measured.
    expect(row('Near-infrared (700–1100 nm)')).toContain('5.00 mW/cm²');
    expect(row('Near-infrared (700–1100 nm)')).toContain('only 700–750 nm of it was integrated');
    expect(row('Total over 550–750 nm')).toContain('20.0 mW/cm²');
    expect(within(card).getByText('No problems found.')).toBeTruthy();
    // Irradiance on the page: the cautions and the not-advice sentence are there too.
    expect(screen.getByText('These are measurements of a device, not treatment advice.')).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Cautions for these figures' })).toBeTruthy();
    expect(screen.getByText('Checked 1 spectrum file: 1 readable, 0 rejected.')).toBeTruthy();
  });

  it('says "not measured", not 0, for a band the file does not reach', async () => {
    // 400–590 nm only: nothing of red (600–700 nm) or near-infrared (700–1100 nm) was measured.
    const { user } = openPage();
    const rows = ['Wavelength (nm),Irradiance (W/m2/nm)'];
    for (let nm = 400; nm <= 590; nm += 10) rows.push(`${nm},1`);
    await user.upload(await screen.findByLabelText('Spectrum files', {}, slow), new File([`${rows.join('\n')}\n`], 'blue.csv'));
    const card = (await screen.findByRole('heading', { level: 3, name: /blue\.csv/ }, slow)).closest('section')!;
    expect(await within(card).findByText('Readable', {}, slow)).toBeTruthy();
    const figures = within(card).getByRole('table', { name: 'Figures for blue.csv' });
    const red = within(figures).getByRole('rowheader', { name: 'Red (600–700 nm)' }).closest('tr')!.textContent;
    expect(red).toContain('not measured');
    expect(red).not.toContain('mW/cm²');
    expect(red).toContain('does not reach this band at all');
    expect(within(card).getAllByText(/lies wholly outside the measured range 400–590 nm/)).toHaveLength(2);
  });

  it('shows an invalid file as rejected with its error and line', async () => {
    const { user } = openPage();
    const input = await screen.findByLabelText('Spectrum files', {}, slow);
    await user.upload(input, new File(['Wavelength (nm),Temperature (C)\n600,1\n610,1\n'], 'wrong.csv'));
    const card = (await screen.findByRole('heading', { level: 3, name: /wrong\.csv/ }, slow)).closest('section')!;
    expect(await within(card).findByText('Rejected', {}, slow)).toBeTruthy();
    const problem = within(card).getByText(/No spectral irradiance column could be told apart/).closest('li')!;
    expect(problem.textContent).toContain('Error');
    expect(problem.textContent).toContain('Line 1');
    expect(screen.queryByText('Cautions for these figures')).toBeNull();
  });

  it('reads a file that names no unit once a unit is chosen for it', async () => {
    const { user } = openPage();
    await user.upload(await screen.findByLabelText('Spectrum files', {}, slow), new File([flatSpectrum('Wavelength (nm),Irradiance')], 'bare.csv'));
    const card = (await screen.findByRole('heading', { level: 3, name: /bare\.csv/ }, slow)).closest('section')!;
    expect(await within(card).findByText('Rejected', {}, slow)).toBeTruthy();
    expect(within(card).getByText(/No unit found/).closest('li')!.textContent).toContain('Whole file');

    await user.selectOptions(screen.getByLabelText('Unit if the file does not say'), 'mW/cm2/nm');
    expect(await within(card).findByText('Readable', {}, slow)).toBeTruthy();
    const figures = within(card).getByRole('table', { name: 'Figures for bare.csv' });
    expect(figures.textContent).toContain('mW/cm²/nm');
    expect(figures.textContent).toContain('chosen on this page');
    // 1 mW/cm²/nm over 100 nm = 100 mW/cm².
    expect(within(figures).getByRole('rowheader', { name: 'Red (600–700 nm)' }).closest('tr')!.textContent).toContain('100 mW/cm²');
  });

  it('maps a meter-readings file: spread widths, edge notes, areas, falloff and uniformity', async () => {
    const { user } = openPage();
    await user.upload(await screen.findByLabelText('Meter readings file', {}, slow), new File([meterFile()], 'grid.csv'));

    expect(await screen.findByText('Checked the meter readings file: 18 readings on 2 planes (10 cm, 20 cm).', {}, slow)).toBeTruthy();
    expect(screen.getByRole('img', { name: /Coverage map at 10 cm/ })).toBeTruthy();
    const widths = screen.getByRole('table', { name: 'Spread widths and areas at 10 cm' });
    const level = (pct: number) => within(widths).getByRole('rowheader', { name: `${pct} % of peak` }).closest('tr')!.textContent;
    expect(level(80)).toContain('10 cm');
    expect(level(80)).toContain('x -5 to 5 cm');
    expect(level(80)).not.toContain('Reached the edge');
    expect(level(50)).toContain('≥ 20 cm');
    expect(level(50)).toContain('Reached the edge of the grid');
    expect(level(80)).toMatch(/\d+ cm²/);

    const figures = screen.getByRole('table', { name: 'Plane at 10 cm' });
    expect(figures.textContent).toContain('100 mW/cm²');
    expect(figures.textContent).toContain('(1,000 W/m²)');
    expect(screen.getByText(/Falloff exponent across the planes/).textContent).toContain('2.00');

    // Uniformity appears once an emitting area is given. Readings only: U₀ = 36 / (484 / 9) = 0.669.
    // Over the area (the headline, first): the bilinear map's mean over each 10 × 10 cm cell is the
    // mean of its corners, (100 + 60 + 60 + 36)/4 = 64, so U₀ = 36/64 = 0.5625 (hand-computed).
    await user.type(screen.getByLabelText('W (cm)'), '20');
    await user.type(screen.getByLabelText('H (cm)'), '20');
    const planeTable = screen.getByRole('table', { name: 'Plane at 10 cm' });
    const u0 = within(planeTable).getByRole('rowheader', { name: 'Minimum / mean (U₀)' });
    expect(u0.closest('tr')!.textContent).toContain('0.669');
    const [areaCell, readingsCell] = [...u0.closest('tr')!.querySelectorAll('td')].map((td) => td.textContent);
    expect(areaCell).toBe('0.563');
    expect(readingsCell).toBe('0.669');
    expect(within(planeTable).getByRole('columnheader', { name: 'Over the area (map, area-weighted)' })).toBeTruthy();
    expect(within(planeTable).getByRole('columnheader', { name: 'Readings only (9 inside)' })).toBeTruthy();
    // Readings lie on every edge of the 20 × 20 cm area: no warning.
    expect(screen.queryByRole('list', { name: 'Uniformity warnings at 10 cm' })).toBeNull();
    // A wider area than the grid: the map covers 400/900 of it, and the page says both things.
    await user.clear(screen.getByLabelText('W (cm)'));
    await user.clear(screen.getByLabelText('H (cm)'));
    await user.type(screen.getByLabelText('W (cm)'), '30');
    await user.type(screen.getByLabelText('H (cm)'), '30');
    const warnings = screen.getByRole('list', { name: 'Uniformity warnings at 10 cm' });
    expect(warnings.textContent).toMatch(/No reading lies on or within 0.5 cm/);
    expect(warnings.textContent).toMatch(/cover 44.4 % of the 30 × 30 cm emitting area/);
    const covered = within(screen.getByRole('table', { name: 'Plane at 10 cm' })).getByRole('rowheader', { name: 'Area the readings cover' });
    expect(covered.closest('tr')!.textContent).toContain('44.4 %');

    await user.click(screen.getByRole('radio', { name: '20 cm' }));
    expect(screen.getByRole('table', { name: 'Spread widths and areas at 20 cm' })).toBeTruthy();
    expect(screen.getByRole('table', { name: 'Plane at 20 cm' }).textContent).toContain('25.0 mW/cm²');
  });

  it('refuses nothing to a tester: the lab nav links to it', async () => {
    openPage();
    const nav = await screen.findByRole('navigation', { name: 'Lab' }, slow);
    expect(within(nav).getByRole('link', { name: 'File check' }).getAttribute('href')).toBe('/lab/check');
  });
});
