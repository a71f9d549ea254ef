import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderApp } from '#src/test/render-app.tsx';
import { errorAnswer, stubFetch } from '#src/test/fetch-stub.ts';

describe('subscribe page', () => {
  it('checks the address and topics with the shared schema, then sends the parsed body and says to check the e-mail', async () => {
    const { calls } = stubFetch({ 'POST /api/public/subscriptions': { status: 202, body: { status: 'check_your_email' } } });
    const { user } = renderApp('/subscribe');
    await screen.findByRole('heading', { level: 1, name: 'New reports by e-mail' });
    await user.type(screen.getByLabelText('E-mail', { exact: true }), 'nope');
    await user.click(screen.getByRole('radio', { name: 'Only some kinds of device' }));
    await user.click(screen.getByRole('button', { name: 'Subscribe' }));
    expect(await screen.findByText('Enter a valid e-mail address.')).toBeTruthy();
    expect(screen.getByText('Choose at least one kind of device, or every report.')).toBeTruthy();
    expect(calls.some((c) => c.method === 'POST')).toBe(false);

    await user.clear(screen.getByLabelText('E-mail', { exact: true }));
    await user.type(screen.getByLabelText('E-mail', { exact: true }), ' Reader@Example.TEST ');
    await user.click(screen.getByRole('checkbox', { name: 'Mats' }));
    await user.click(screen.getByRole('checkbox', { name: 'Pads' }));
    await user.click(screen.getByRole('checkbox', { name: /corrected/ }));
    await user.click(screen.getByRole('button', { name: 'Subscribe' }));
    expect(await screen.findByText('Check your e-mail')).toBeTruthy();
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ email: 'reader@example.test', topics: { categories: ['mat', 'pad'] }, corrections: true });
  });

  it('says when the network is over its limit', async () => {
    stubFetch({ 'POST /api/public/subscriptions': { ...errorAnswer(429, 'rate_limited', 'Too many', { retryAfterSeconds: 600 }) } });
    const { user } = renderApp('/subscribe');
    await user.type(await screen.findByLabelText('E-mail', { exact: true }), 'reader@example.test');
    await user.click(screen.getByRole('button', { name: 'Subscribe' }));
    expect(await screen.findByText('Too many requests from your network. Try again in 10 minutes.')).toBeTruthy();
  });
});

describe('confirmation page', () => {
  it('confirms only when the reader presses the button, with one POST of the token', async () => {
    const { calls } = stubFetch({ 'POST /api/public/subscriptions/confirm': { body: { status: 'confirmed' } } });
    const { user } = renderApp('/subscribe/confirm?token=abcdefghijklmnopqrstuvwxyz0123456789ABCDEFG');
    const button = await screen.findByRole('button', { name: 'Confirm my subscription' });
    expect(calls.filter((c) => c.path.startsWith('/api/public/subscriptions'))).toHaveLength(0);
    await user.click(button);
    expect(await screen.findByText('You are subscribed')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST').map((c) => c.body)).toEqual([{ token: 'abcdefghijklmnopqrstuvwxyz0123456789ABCDEFG' }]);
  });

  it('explains an expired link and offers a new one', async () => {
    stubFetch({ 'POST /api/public/subscriptions/confirm': errorAnswer(410, 'token_expired', 'This link has expired. Ask for a new one.') });
    const { user } = renderApp('/subscribe/confirm?token=abcdefghijklmnopqrstuvwxyz0123456789ABCDEFG');
    await user.click(await screen.findByRole('button', { name: 'Confirm my subscription' }));
    expect(await screen.findByText('This link has expired')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Subscribe again to get a new link.' }).getAttribute('href')).toBe('/subscribe');
  });
});
