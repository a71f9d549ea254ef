import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { stubFetch } from '#src/test/fetch-stub.ts';
import { renderApp } from '#src/test/render-app.tsx';

// The shape the server sends: marked's HTML of docs/methodology.md after sanitising.
const html = [
  '<h1>Methodology</h1>',
  '<p>How Benchlight turns instrument files into figures.</p>',
  '<h2>1. Reading files</h2>',
  '<h3>Spectrum exports</h3>',
  '<p>Text in <code>UTF-8</code>.</p>',
  '<table><thead><tr><th>figure</th><th>formula</th></tr></thead><tbody><tr><td>U₀</td><td>E_min / E_mean</td></tr></tbody></table>',
  '<h2>3. One plane</h2>',
  '<pre><code>E = E₁·(d/d₁)^−c</code></pre>',
  '<h2>Cautions</h2>',
  '<ul><li>Protect the eyes and never look into the emitters.</li></ul>',
].join('\n');

describe('methodology', () => {
  it('renders the document in full under the page heading, with a table of contents', async () => {
    stubFetch({ 'GET /api/public/methodology': { body: { html } } });
    renderApp('/methodology');
    const article = await screen.findByRole('article', { name: 'Methodology' });
    // The page has one h1; the document's own is dropped.
    expect(screen.getAllByRole('heading', { level: 1 }).map((h) => h.textContent)).toEqual(['Methodology']);
    expect(within(article).getAllByRole('heading', { level: 2 }).map((h) => h.textContent)).toEqual(['1. Reading files', '3. One plane', 'Cautions']);
    expect(within(article).getByText('E_min / E_mean').closest('[role="region"]')?.getAttribute('aria-label')).toBe('Table in Spectrum exports, scrollable');
    expect(within(article).getByText('E = E₁·(d/d₁)^−c').closest('pre')?.getAttribute('tabindex')).toBe('0');
    expect(within(article).getByText('Protect the eyes and never look into the emitters.')).toBeTruthy();

    const toc = screen.getByRole('navigation', { name: 'On this page' });
    const links = within(toc).getAllByRole('link').map((a) => [a.textContent, a.getAttribute('href')]);
    expect(links).toEqual([
      ['1. Reading files', '#1-reading-files'],
      ['Spectrum exports', '#spectrum-exports'],
      ['3. One plane', '#3-one-plane'],
      ['Cautions', '#cautions'],
    ]);
    // Each link leads to its heading.
    expect(document.getElementById('3-one-plane')?.textContent).toBe('3. One plane');
    expect(document.title).toBe('Methodology · Benchlight');
  });

  it('says so when the document cannot be loaded, and offers to try again', async () => {
    stubFetch({ 'GET /api/public/methodology': 'network-error' });
    renderApp('/methodology');
    expect(await screen.findByRole('heading', { name: "Can't reach the server" })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeTruthy();
  });
});
