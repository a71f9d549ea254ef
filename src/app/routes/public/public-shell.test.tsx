import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderApp } from '#src/test/render-app.tsx';
import { stubFetch } from '#src/test/fetch-stub.ts';

describe('public shell', () => {
  it('shows the main navigation, the staff link and the home page', async () => {
    stubFetch({ 'GET /api/public/reports': { body: { reports: [] } } });
    renderApp('/');
    const nav = await screen.findByRole('navigation', { name: 'Main' });
    const labels = within(nav)
      .getAllByRole('link')
      .map((a) => [a.textContent, a.getAttribute('href')]);
    expect(labels).toEqual([
      ['Reports', '/reports'],
      ['Compare', '/compare'],
      ['Methodology', '/methodology'],
      ['Request a test', '/request'],
      ['Subscribe', '/subscribe'],
    ]);
    expect(screen.getByRole('link', { name: 'Benchlight' }).getAttribute('href')).toBe('/');
    expect(screen.getByRole('link', { name: 'Staff sign-in' }).getAttribute('href')).toBe('/lab');
    expect(screen.getByRole('heading', { level: 1 })).toBeTruthy();
    expect(await screen.findByText('No reports published yet')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Skip to main content' }).getAttribute('href')).toBe('#main');
    expect(screen.getByRole('main').id).toBe('main');
  });

  it('carries every caution and "measurements, not medical advice" in the footer', async () => {
    stubFetch({ 'GET /api/public/reports': { body: { reports: [] } } });
    renderApp('/');
    const footer = await screen.findByRole('contentinfo');
    const text = footer.textContent ?? '';
    expect(text).toContain('measurements, not medical advice');
    for (const fragment of [
      'never look into the emitters',
      'Near-infrared light is invisible',
      'blink reflex',
      'Heat adds up with closeness and with time',
      'photosensitising medicines',
      'light-sensitive condition',
      'not treatment advice',
      'Local regulations and licensed practice come first',
    ]) {
      expect(text).toContain(fragment);
    }
  });

  it('marks the section of the page in the main navigation', async () => {
    stubFetch({ 'GET /api/public/test-requests': { body: { requests: [] } } });
    renderApp('/request');
    expect((await screen.findByRole('heading', { level: 1 })).textContent).toBe('Which device should we test next?');
    const current = within(screen.getByRole('navigation', { name: 'Main' })).getByRole('link', { name: 'Request a test' });
    expect(current.getAttribute('aria-current')).toBe('page');
  });

  it('shows "Page not found" with a link home for an unknown path', async () => {
    stubFetch({});
    renderApp('/no/such/page');
    expect((await screen.findByRole('heading', { level: 1 })).textContent).toBe('Page not found');
    expect(screen.getByRole('link', { name: 'Go to the home page' }).getAttribute('href')).toBe('/');
  });
});
