import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderApp } from '#src/test/render-app.tsx';
import { errorAnswer, meAnswer, people, stubFetch } from '#src/test/fetch-stub.ts';
import { safeNext } from '../hooks/use-safe-next.ts';

async function fillAndSubmit(user: ReturnType<typeof renderApp>['user']) {
  await user.type(await screen.findByLabelText('E-mail'), 'tess.tester@bench.test');
  await user.type(screen.getByLabelText('Password'), 'not the right one');
  await user.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('sign-in form', () => {
  it('shows the generic error on 401 invalid_credentials', async () => {
    stubFetch({ 'POST /api/auth/sign-in': errorAnswer(401, 'invalid_credentials', 'Wrong password for this user') });
    const { user } = renderApp('/lab/sign-in');
    await fillAndSubmit(user);
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('E-mail or password is not right.');
    expect(alert.textContent).not.toContain('Wrong password');
  });

  it('shows the rate-limit message with minutes on 429', async () => {
    stubFetch({
      'POST /api/auth/sign-in': errorAnswer(429, 'rate_limited', 'Slow down', { retryAfterSeconds: 290 }),
    });
    const { user } = renderApp('/lab/sign-in');
    await fillAndSubmit(user);
    expect((await screen.findByRole('alert')).textContent).toContain('Too many attempts, try again in 5 minutes.');
  });

  it('shows a rate-limit message without details too', async () => {
    stubFetch({ 'POST /api/auth/sign-in': errorAnswer(429, 'rate_limited', 'Slow down') });
    const { user } = renderApp('/lab/sign-in');
    await fillAndSubmit(user);
    expect((await screen.findByRole('alert')).textContent).toContain('Too many attempts, try again in a few minutes.');
  });

  it('asks for both fields before sending anything', async () => {
    const { calls } = stubFetch({});
    const { user } = renderApp('/lab/sign-in');
    await user.click(await screen.findByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter your e-mail address.')).toBeTruthy();
    expect(screen.getByText('Enter your password.')).toBeTruthy();
    expect(screen.getByLabelText('E-mail').getAttribute('aria-invalid')).toBe('true');
    expect(calls.length).toBe(0);
  });

  it('goes to `next` after signing in', async () => {
    const { calls } = stubFetch({
      'POST /api/auth/sign-in': { status: 200, body: { user: people.editor } },
      'GET /api/me': meAnswer(people.editor),
    });
    const { user, router } = renderApp('/lab/sign-in?next=%2Flab%2Freview');
    await fillAndSubmit(user);
    expect((await screen.findByRole('heading', { level: 1, name: 'Review' })).textContent).toBe('Review');
    expect(router.state.location.pathname).toBe('/lab/review');
    const post = calls.find((c) => c.method === 'POST');
    expect(post?.body).toEqual({ email: 'tess.tester@bench.test', password: 'not the right one' });
    expect(post?.credentials).toBe('same-origin');
  });
});

describe('safeNext', () => {
  it('keeps paths inside the lab and refuses everything else', () => {
    expect(safeNext('/lab/runs?x=1')).toBe('/lab/runs?x=1');
    expect(safeNext('/lab')).toBe('/lab');
    expect(safeNext(null)).toBe('/lab');
    expect(safeNext('https://elsewhere.example/lab')).toBe('/lab');
    expect(safeNext('//elsewhere.example')).toBe('/lab');
    expect(safeNext('/laboratory')).toBe('/lab');
    expect(safeNext('/reports')).toBe('/lab');
    expect(safeNext('/lab/sign-in')).toBe('/lab');
  });
});
