import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { Maker } from '#shared/schemas/makers.ts';
import { aDeviceUnit, aMaker, aModel, anInstrument, page } from '#src/test/catalog-fixtures.ts';
import { errorAnswer, meAnswer, people, stubFetch, type FetchCall } from '#src/test/fetch-stub.ts';
import { renderApp } from '#src/test/render-app.tsx';

const posts = (calls: FetchCall[], path: string) => calls.filter((c) => c.method === 'POST' && c.path === path).map((c) => c.body);

function labApi(handlers: Parameters<typeof stubFetch>[0]) {
  return stubFetch({ 'GET /api/me': meAnswer(people.tester), ...handlers });
}

/** The error text a field points at with aria-describedby: the message shown beside it. */
function messageBeside(control: HTMLElement): string {
  const ids = control.getAttribute('aria-describedby')?.split(' ') ?? [];
  return ids
    .filter((id) => id.endsWith('-error'))
    .map((id) => document.getElementById(id)?.textContent ?? '')
    .join(' ')
    .replace('✕ ', '');
}

async function openMakerForm(user: ReturnType<typeof renderApp>['user']) {
  await screen.findByRole('table', { name: 'Makers' });
  await user.click(screen.getByRole('button', { name: 'Add maker' }));
  const form = screen.getByRole('form', { name: 'Add a maker' });
  expect(document.activeElement?.textContent).toBe('Add a maker'); // focus lands on the form's heading
  return form;
}

describe('adding and editing a maker', () => {
  it('posts the body, announces the new maker and shows it in the refreshed table', async () => {
    const rows: Maker[] = [aMaker('mk-1', 'Aurelux')];
    const { calls } = labApi({
      'GET /api/lab/makers': () => page(rows),
      'POST /api/lab/makers': (body) => {
        const maker = aMaker('mk-9', (body as { name: string }).name, { website: 'https://lumenra.example' });
        rows.push(maker);
        return { status: 201, body: { maker } };
      },
    });
    const { user } = renderApp('/lab/catalog');
    const form = await openMakerForm(user);
    await user.type(within(form).getByLabelText('Name'), '  Lumenra ');
    await user.type(within(form).getByLabelText('Website'), 'https://lumenra.example');
    await user.click(within(form).getByRole('button', { name: 'Add maker' }));

    expect(await screen.findByText('Maker “Lumenra” added to the catalogue.')).toBeTruthy();
    expect(screen.getByText('Maker “Lumenra” added to the catalogue.').closest('[aria-live="polite"]')).toBeTruthy();
    expect(posts(calls, '/api/lab/makers')).toEqual([{ name: 'Lumenra', website: 'https://lumenra.example', notes: '' }]);
    expect(screen.queryByRole('form', { name: 'Add a maker' })).toBeNull();
    const table = screen.getByRole('table', { name: 'Makers' });
    expect(await within(table).findByRole('rowheader', { name: 'Lumenra' })).toBeTruthy();
    // Focus goes back to the button that opened the form.
    expect(document.activeElement).toBe(screen.getByRole('button', { name: 'Add maker' }));
  });

  it('checks the fields with the shared schema before sending anything', async () => {
    const { calls } = labApi({ 'GET /api/lab/makers': page([]) });
    const { user } = renderApp('/lab/catalog');
    const form = await openMakerForm(user);
    await user.type(within(form).getByLabelText('Website'), 'lumenra.example');
    await user.click(within(form).getByRole('button', { name: 'Add maker' }));
    const name = within(form).getByLabelText('Name');
    await waitFor(() => expect(messageBeside(name)).toBe('Enter the maker’s name.'));
    expect(name.getAttribute('aria-invalid')).toBe('true');
    expect(messageBeside(within(form).getByLabelText('Website'))).toBe('Enter a full address, e.g. https://…');
    expect(posts(calls, '/api/lab/makers')).toEqual([]);
  });

  it('shows a 409 duplicate beside the name field', async () => {
    labApi({
      'GET /api/lab/makers': page([aMaker('mk-1', 'Aurelux')]),
      'POST /api/lab/makers': errorAnswer(409, 'conflict', 'A maker of this name is already in the catalogue.', [
        { path: 'body.name', message: 'A maker of this name is already in the catalogue.' },
      ]),
    });
    const { user } = renderApp('/lab/catalog');
    const form = await openMakerForm(user);
    const name = within(form).getByLabelText('Name');
    await user.type(name, 'aurelux');
    await user.click(within(form).getByRole('button', { name: 'Add maker' }));
    await waitFor(() => expect(messageBeside(name)).toBe('A maker of this name is already in the catalogue.'));
    expect(name.getAttribute('aria-invalid')).toBe('true');
    expect(document.activeElement).toBe(name);
    // Placed on its field, so no second, general message.
    expect(within(form).queryByRole('alert')).toBeNull();
  });

  it('shows 422 field messages beside their fields, and a general message for the rest', async () => {
    labApi({
      'GET /api/lab/makers': page([]),
      'POST /api/lab/makers': errorAnswer(422, 'validation_failed', 'Some fields are not valid.', [
        { path: 'body.website', message: 'The server refused this address.' },
        { path: 'body.notes', message: 'Notes are too long for the server.' },
        { path: 'body.colour', message: 'A field this form does not have.' },
      ]),
    });
    const { user } = renderApp('/lab/catalog');
    const form = await openMakerForm(user);
    await user.type(within(form).getByLabelText('Name'), 'Lumenra');
    await user.type(within(form).getByLabelText('Website'), 'https://lumenra.example');
    await user.click(within(form).getByRole('button', { name: 'Add maker' }));
    await waitFor(() => expect(messageBeside(within(form).getByLabelText('Website'))).toBe('The server refused this address.'));
    expect(messageBeside(within(form).getByLabelText('Notes'))).toBe('Notes are too long for the server.');
    expect(within(form).getByRole('alert').textContent).toContain('The maker was not saved: Some fields are not valid.');
  });

  it('says the save failed when the server cannot be reached', async () => {
    labApi({ 'GET /api/lab/makers': page([]), 'POST /api/lab/makers': 'network-error' });
    const { user } = renderApp('/lab/catalog');
    const form = await openMakerForm(user);
    await user.type(within(form).getByLabelText('Name'), 'Lumenra');
    await user.click(within(form).getByRole('button', { name: 'Add maker' }));
    expect((await within(form).findByRole('alert')).textContent).toContain("Can't reach the server. The maker was not saved");
  });

  it('edits a row in the same form, filled in, and PATCHes it', async () => {
    const { calls } = labApi({
      'GET /api/lab/makers': page([aMaker('mk-1', 'Aurelux', { website: 'https://aurelux.example', notes: 'Sent two panels.' })]),
      'PATCH /api/lab/makers/mk-1': (body) => ({ body: { maker: aMaker('mk-1', (body as { name: string }).name) } }),
    });
    const { user } = renderApp('/lab/catalog');
    await user.click(await screen.findByRole('button', { name: 'Edit Aurelux' }));
    const form = screen.getByRole('form', { name: 'Edit maker Aurelux' });
    const name = within(form).getByLabelText('Name') as HTMLInputElement;
    expect(name.value).toBe('Aurelux');
    expect((within(form).getByLabelText('Notes') as HTMLTextAreaElement).value).toBe('Sent two panels.');
    await user.clear(name);
    await user.type(name, 'Aurelux Labs');
    await user.clear(within(form).getByLabelText('Website'));
    await user.click(within(form).getByRole('button', { name: 'Save maker' }));
    expect(await screen.findByText('Maker “Aurelux Labs” saved.')).toBeTruthy();
    expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ name: 'Aurelux Labs', website: null, notes: 'Sent two panels.' });
    expect(document.activeElement).toBe(screen.getByRole('button', { name: 'Edit Aurelux' }));
  });
});

describe('adding a model', () => {
  const makersForSelect = page([aMaker('mk-1', 'Aurelux'), aMaker('mk-2', 'Brightfold')]);

  async function openModelForm(user: ReturnType<typeof renderApp>['user']) {
    await screen.findByRole('table', { name: 'Models' });
    await user.click(screen.getByRole('button', { name: 'Add model' }));
    const form = screen.getByRole('form', { name: 'Add a model' });
    await waitFor(() => expect((within(form).getByLabelText('Maker') as HTMLSelectElement).disabled).toBe(false));
    return form;
  }

  it('sends the price as integer minor units, with the wavelengths and claims as numbers', async () => {
    const { calls } = labApi({
      'GET /api/lab/models': page([]),
      'GET /api/lab/makers': makersForSelect,
      'POST /api/lab/models': { status: 201, body: { model: aModel('md-9', 'Halo 900', { makerId: 'mk-2', makerName: 'Brightfold' }) } },
    });
    const { user } = renderApp('/lab/catalog?tab=models');
    const form = await openModelForm(user);
    await user.selectOptions(within(form).getByLabelText('Maker'), 'mk-2');
    await user.type(within(form).getByLabelText('Name'), 'Halo 900');
    await user.selectOptions(within(form).getByLabelText('Category'), 'panel');
    await user.type(within(form).getByLabelText('Width (cm)'), '30.5');
    await user.type(within(form).getByLabelText('Height (cm)'), '91');
    await user.type(within(form).getByLabelText('LED count'), '300');
    await user.click(within(form).getByRole('button', { name: 'Add a wavelength' }));
    await user.type(within(form).getByLabelText('Wavelength 1 (nm)'), '660');
    await user.type(within(form).getByLabelText('Share 1 (%)'), '60');
    await user.click(within(form).getByRole('button', { name: 'Add a wavelength' }));
    await user.type(within(form).getByLabelText('Wavelength 2 (nm)'), '850');
    await user.type(within(form).getByLabelText('Claimed irradiance (mW/cm²)'), '120');
    await user.type(within(form).getByLabelText('Claimed at distance (cm)'), '15');
    await user.type(within(form).getByLabelText('Price'), '1299.9');
    await user.type(within(form).getByLabelText('Currency'), 'eur');
    await user.type(within(form).getByLabelText('Links'), 'https://brightfold.example/halo-900\n\nhttps://brightfold.example/manual.pdf');
    await user.click(within(form).getByRole('button', { name: 'Add model' }));

    expect(await screen.findByText('Model “Brightfold Halo 900” added to the catalogue.')).toBeTruthy();
    const [body] = posts(calls, '/api/lab/models') as Array<Record<string, unknown>>;
    expect(body.price).toEqual({ amountMinor: 129990, currency: 'EUR' });
    expect(Number.isInteger((body.price as { amountMinor: number }).amountMinor)).toBe(true);
    expect(body).toMatchObject({
      makerId: 'mk-2',
      name: 'Halo 900',
      category: 'panel',
      emittingAreaCm: { width: 30.5, height: 91 },
      ledCount: 300,
      nominalWavelengths: [
        { nm: 660, sharePct: 60 },
        { nm: 850, sharePct: null },
      ],
      claims: { irradianceMwCm2: 120, atDistanceCm: 15, beamAngleDeg: null, beamAngleKind: null },
      powerW: null,
      links: ['https://brightfold.example/halo-900', 'https://brightfold.example/manual.pdf'],
    });
  });

  it('checks the required fields, then the price and the claims, before sending anything', async () => {
    const { calls } = labApi({ 'GET /api/lab/models': page([]), 'GET /api/lab/makers': makersForSelect });
    const { user } = renderApp('/lab/catalog?tab=models');
    const form = await openModelForm(user);
    await user.type(within(form).getByLabelText('Price'), '19.999');
    await user.type(within(form).getByLabelText('Currency'), 'EUR');
    await user.type(within(form).getByLabelText('Claimed beam angle (°)'), '60');
    await user.click(within(form).getByRole('button', { name: 'Add model' }));
    await waitFor(() => expect(messageBeside(within(form).getByLabelText('Price'))).toBe('Use at most 2 decimals for EUR.'));
    expect(messageBeside(within(form).getByLabelText('Maker'))).toBe('Choose the maker.');
    expect(messageBeside(within(form).getByLabelText('Category'))).toBe('Choose a category.');
    expect(messageBeside(within(form).getByLabelText('Width (cm)'))).toBe('Enter the width.');

    // The shared schema's rule across fields speaks once the fields themselves are right.
    await user.selectOptions(within(form).getByLabelText('Maker'), 'mk-1');
    await user.type(within(form).getByLabelText('Name'), 'Halo 900');
    await user.selectOptions(within(form).getByLabelText('Category'), 'cap');
    await user.type(within(form).getByLabelText('Width (cm)'), '20');
    await user.type(within(form).getByLabelText('Height (cm)'), 'twenty');
    await user.click(within(form).getByRole('button', { name: 'Add model' }));
    await waitFor(() => expect(messageBeside(within(form).getByLabelText('Height (cm)'))).toBe('Enter the height.'));
    await user.clear(within(form).getByLabelText('Height (cm)'));
    await user.type(within(form).getByLabelText('Height (cm)'), '20');
    await user.click(within(form).getByRole('button', { name: 'Add model' }));
    await waitFor(() =>
      expect(messageBeside(within(form).getByLabelText('The beam angle is a'))).toBe('Say whether the claimed beam angle is a full or a half angle.'),
    );
    expect(messageBeside(within(form).getByLabelText('Price'))).toBe('Use at most 2 decimals for EUR.');
    expect(posts(calls, '/api/lab/models')).toEqual([]);
  });

  it('puts a 422 on a nested field beside that field', async () => {
    labApi({
      'GET /api/lab/models': page([]),
      'GET /api/lab/makers': makersForSelect,
      'POST /api/lab/models': errorAnswer(422, 'validation_failed', 'Some fields are not valid.', [
        { path: 'body.emittingAreaCm.height', message: 'The server wants a smaller height.' },
        { path: 'body.price.amountMinor', message: 'The server refused this price.' },
      ]),
    });
    const { user } = renderApp('/lab/catalog?tab=models');
    const form = await openModelForm(user);
    await user.selectOptions(within(form).getByLabelText('Maker'), 'mk-1');
    await user.type(within(form).getByLabelText('Name'), 'Halo 900');
    await user.selectOptions(within(form).getByLabelText('Category'), 'mat');
    await user.type(within(form).getByLabelText('Width (cm)'), '30');
    await user.type(within(form).getByLabelText('Height (cm)'), '90');
    await user.type(within(form).getByLabelText('Price'), '10');
    await user.type(within(form).getByLabelText('Currency'), 'GBP');
    await user.click(within(form).getByRole('button', { name: 'Add model' }));
    await waitFor(() => expect(messageBeside(within(form).getByLabelText('Height (cm)'))).toBe('The server wants a smaller height.'));
    expect(messageBeside(within(form).getByLabelText('Price'))).toBe('The server refused this price.');
  });

  it('edits a model without its maker, the price shown back in major units', async () => {
    const { calls } = labApi({
      'GET /api/lab/models': page([aModel('md-1', 'Halo 600')]),
      'PATCH /api/lab/models/md-1': { body: { model: aModel('md-1', 'Halo 600') } },
    });
    const { user } = renderApp('/lab/catalog?tab=models');
    await user.click(await screen.findByRole('button', { name: 'Edit Aurelux Halo 600' }));
    const form = screen.getByRole('form', { name: 'Edit model Aurelux Halo 600' });
    const price = within(form).getByLabelText('Price') as HTMLInputElement;
    expect(price.value).toBe('499.00');
    await user.clear(price);
    await user.type(price, '449.5');
    await user.click(within(form).getByRole('button', { name: 'Save model' }));
    expect(await screen.findByText('Model “Aurelux Halo 600” saved.')).toBeTruthy();
    const patch = calls.find((c) => c.method === 'PATCH')?.body as Record<string, unknown>;
    expect(patch.price).toEqual({ amountMinor: 44950, currency: 'EUR' });
    expect('makerId' in patch).toBe(false);
  });
});

describe('adding a unit', () => {
  it('chooses the model from its own list and sends blanks as null', async () => {
    const { calls } = labApi({
      'GET /api/lab/units': page([]),
      'GET /api/lab/models': page([aModel('md-1', 'Halo 600'), aModel('md-2', 'Mat 2', { makerName: 'Brightfold' })]),
      'POST /api/lab/units': { status: 201, body: { unit: aDeviceUnit('du-9', 'BF-0042', { modelName: 'Mat 2', makerName: 'Brightfold' }) } },
    });
    const { user } = renderApp('/lab/catalog?tab=units');
    await screen.findByRole('table', { name: 'Units' });
    await user.click(screen.getByRole('button', { name: 'Add unit' }));
    const form = screen.getByRole('form', { name: 'Add a unit' });
    const model = within(form).getByLabelText('Model') as HTMLSelectElement;
    await waitFor(() => expect(model.disabled).toBe(false));
    expect(Array.from(model.options).map((o) => o.textContent)).toEqual(['Choose a model', 'Aurelux Halo 600', 'Brightfold Mat 2']);
    await user.selectOptions(model, 'md-2');
    await user.type(within(form).getByLabelText('Serial number'), 'BF-0042');
    await user.selectOptions(within(form).getByLabelText('How the lab obtained it'), 'loaned');
    await user.click(within(form).getByRole('button', { name: 'Add unit' }));
    expect(await screen.findByText('Unit Brightfold Mat 2, serial BF-0042 added to the catalogue.')).toBeTruthy();
    expect(posts(calls, '/api/lab/units')).toEqual([
      { modelId: 'md-2', serial: 'BF-0042', obtained: 'loaned', receivedOn: null, firmware: null, conditionNotes: '' },
    ]);
  });
});

describe('instruments and their calibration', () => {
  it('warns in the edit form of an instrument whose calibration is overdue', async () => {
    labApi({
      'GET /api/lab/instruments': page([
        anInstrument('in-2', 'Old meter', { kind: 'irradiance_meter', calibrationDueOn: '2024-01-15', calibrationOverdue: true }),
      ]),
    });
    const { user } = renderApp('/lab/catalog?tab=instruments');
    await user.click(await screen.findByRole('button', { name: 'Edit Old meter' }));
    const form = screen.getByRole('form', { name: 'Edit instrument Old meter' });
    expect(within(form).getByText('Calibration overdue')).toBeTruthy();
    expect(within(form).getByText(/was due on 15 Jan 2024/)).toBeTruthy();
  });

  it('sends a new instrument, refusing a due date before the calibration date first', async () => {
    const { calls } = labApi({
      'GET /api/lab/instruments': page([]),
      'POST /api/lab/instruments': { status: 201, body: { instrument: anInstrument('in-9', 'Bench spectro 2') } },
    });
    const { user } = renderApp('/lab/catalog?tab=instruments');
    await screen.findByRole('table', { name: 'Instruments' });
    await user.click(screen.getByRole('button', { name: 'Add instrument' }));
    const form = screen.getByRole('form', { name: 'Add an instrument' });
    await user.selectOptions(within(form).getByLabelText('Kind'), 'spectroradiometer');
    await user.type(within(form).getByLabelText('Name'), 'Bench spectro 2');
    await user.type(within(form).getByLabelText('Serial number'), 'SP-2207');
    await user.type(within(form).getByLabelText('From (nm)'), '350');
    await user.type(within(form).getByLabelText('To (nm)'), '1100');
    await user.type(within(form).getByLabelText('Calibrated on'), '2099-03-01');
    await user.type(within(form).getByLabelText('Due on'), '2099-02-01');
    await user.type(within(form).getByLabelText('Uncertainty (%)'), '4.5');
    await user.click(within(form).getByRole('button', { name: 'Add instrument' }));
    await waitFor(() => expect(messageBeside(within(form).getByLabelText('Due on'))).toBe('The due date comes after the calibration date.'));
    expect(posts(calls, '/api/lab/instruments')).toEqual([]);

    await user.clear(within(form).getByLabelText('Due on'));
    await user.type(within(form).getByLabelText('Due on'), '2100-03-01');
    await user.click(within(form).getByRole('button', { name: 'Add instrument' }));
    expect(await screen.findByText('Instrument “Bench spectro 2” added to the catalogue.')).toBeTruthy();
    expect(posts(calls, '/api/lab/instruments')).toEqual([
      {
        kind: 'spectroradiometer',
        name: 'Bench spectro 2',
        serial: 'SP-2207',
        wavelengthRangeNm: { from: 350, to: 1100 },
        cosineCorrector: null,
        calibratedOn: '2099-03-01',
        calibrationDueOn: '2100-03-01',
        calibrationUncertaintyPct: 4.5,
        notes: '',
      },
    ]);
  });

  it('warns at once when the due date typed has already passed', async () => {
    labApi({ 'GET /api/lab/instruments': page([]) });
    const { user } = renderApp('/lab/catalog?tab=instruments');
    await screen.findByRole('table', { name: 'Instruments' });
    await user.click(screen.getByRole('button', { name: 'Add instrument' }));
    const form = screen.getByRole('form', { name: 'Add an instrument' });
    expect(within(form).queryByText('Calibration overdue')).toBeNull();
    await user.type(within(form).getByLabelText('Due on'), '2001-05-01');
    expect(within(form).getByText('Calibration overdue')).toBeTruthy();
  });
});
