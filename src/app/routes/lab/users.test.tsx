import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { User } from '#shared/schemas/users.ts';
import { renderApp } from '#src/test/render-app.tsx';
import { errorAnswer, meAnswer, people, stubFetch } from '#src/test/fetch-stub.ts';

const stamp = '2025-02-03T10:00:00.000Z';
const asUser = (p: (typeof people)[keyof typeof people], active = true): User => ({
  ...p,
  active,
  createdAt: stamp,
  updatedAt: stamp,
});
const users: User[] = [asUser(people.admin), asUser(people.editor), asUser(people.tester, false)];

function adminApi(extra: Parameters<typeof stubFetch>[0] = {}) {
  return stubFetch({
    'GET /api/me': meAnswer(people.admin),
    'GET /api/admin/users': { body: { users } },
    ...extra,
  });
}

describe('admin users page', () => {
  it('refuses a tester', async () => {
    const { calls } = stubFetch({ 'GET /api/me': meAnswer(people.tester) });
    renderApp('/lab/admin/users');
    expect((await screen.findByRole('heading', { level: 1 })).textContent).toBe('Not allowed');
    expect(screen.getByText('Your role (Tester) cannot manage users.')).toBeTruthy();
    expect(screen.queryByRole('table')).toBeNull();
    expect(calls.some((c) => c.path === '/api/admin/users')).toBe(false);
  });

  it('lists staff for an admin, and protects the admin from demoting or deactivating themselves', async () => {
    adminApi();
    renderApp('/lab/admin/users');
    const table = await screen.findByRole('table', { name: 'Staff accounts' });
    const headers = within(table)
      .getAllByRole('columnheader')
      .map((h) => h.textContent);
    expect(headers).toEqual(['E-mail', 'Name', 'Role', 'Status', 'Created', 'Access']);
    expect(within(table).getAllByRole('row')).toHaveLength(4);
    expect(within(table).getByText('Deactivated')).toBeTruthy();

    const ownRole = screen.getByRole('combobox', { name: `Role for ${people.admin.email}` }) as HTMLSelectElement;
    expect(ownRole.disabled).toBe(true);
    expect(screen.queryByRole('button', { name: `Deactivate ${people.admin.email}` })).toBeNull();
    expect(screen.getByText(/This is you/)).toBeTruthy();

    expect(screen.getByRole('button', { name: `Deactivate ${people.editor.email}` })).toBeTruthy();
    expect(screen.getByRole('button', { name: `Reactivate ${people.tester.email}` })).toBeTruthy();
  });

  it('PATCHes the role only when an admin saves the new one', async () => {
    const { calls } = adminApi({
      'PATCH /api/admin/users/u-eddy': { body: { user: { ...asUser(people.editor), role: 'tester' } } },
    });
    const { user } = renderApp('/lab/admin/users');
    const select = await screen.findByRole('combobox', { name: `Role for ${people.editor.email}` });
    await user.selectOptions(select, 'admin');
    await user.selectOptions(select, 'tester');
    expect(calls.some((c) => c.method === 'PATCH')).toBe(false);
    await user.click(screen.getByRole('button', { name: `Save role for ${people.editor.email}` }));
    expect((await screen.findByText(`${people.editor.email} is now Tester.`)).textContent).toBeTruthy();
    expect(calls.filter((c) => c.method === 'PATCH').map((c) => c.body)).toEqual([{ role: 'tester' }]);
  });

  it('puts the role back when the change is cancelled', async () => {
    const { calls } = adminApi();
    const { user } = renderApp('/lab/admin/users');
    const select = (await screen.findByRole('combobox', { name: `Role for ${people.editor.email}` })) as HTMLSelectElement;
    await user.selectOptions(select, 'tester');
    await user.click(screen.getByRole('button', { name: `Keep the role of ${people.editor.email}` }));
    expect(select.value).toBe('editor');
    expect(screen.queryByRole('button', { name: `Save role for ${people.editor.email}` })).toBeNull();
    expect(calls.some((c) => c.method === 'PATCH')).toBe(false);
  });

  it('asks for confirmation before deactivating', async () => {
    const { calls } = adminApi({
      'PATCH /api/admin/users/u-eddy': { body: { user: asUser(people.editor, false) } },
    });
    const { user } = renderApp('/lab/admin/users');
    await user.click(await screen.findByRole('button', { name: `Deactivate ${people.editor.email}` }));
    expect(calls.some((c) => c.method === 'PATCH')).toBe(false);
    await user.click(screen.getByRole('button', { name: `Confirm deactivate ${people.editor.email}` }));
    expect(await screen.findByText(`${people.editor.email} is deactivated.`)).toBeTruthy();
    expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ active: false });
  });
});

describe('invite a staff member form', () => {
  const invitation = { id: 'inv-1', email: 'new.person@bench.test', displayName: 'New Person', role: 'editor', status: 'pending', invitedBy: 'Ada Admin', expiresAt: '2025-02-06T10:00:00.000Z', createdAt: stamp, acceptedAt: null };

  it('shows validation errors from the shared schema and sends nothing', async () => {
    const { calls } = adminApi({ 'GET /api/admin/invitations': { body: { invitations: [] } } });
    const { user } = renderApp('/lab/admin/users');
    const form = await screen.findByRole('form', { name: 'Invite a staff member' });
    expect(within(form).queryByLabelText(/password/i)).toBeNull();
    await user.type(within(form).getByLabelText('E-mail'), 'not-an-address');
    await user.click(within(form).getByRole('button', { name: 'Send the invitation' }));
    expect(await within(form).findByText('Enter a valid e-mail address.')).toBeTruthy();
    expect(within(form).getByText('Enter a name.')).toBeTruthy();
    expect(within(form).getByLabelText('E-mail').getAttribute('aria-invalid')).toBe('true');
    expect(calls.some((c) => c.method === 'POST')).toBe(false);
  });

  it('sends the parsed body, confirms, and shows email_taken on the field', async () => {
    let answer: { status: number; body: unknown } = { status: 201, body: { invitation } };
    const { calls } = adminApi({ 'GET /api/admin/invitations': { body: { invitations: [] } }, 'POST /api/admin/invitations': () => answer });
    const { user } = renderApp('/lab/admin/users');
    const form = await screen.findByRole('form', { name: 'Invite a staff member' });
    await user.type(within(form).getByLabelText('E-mail'), '  New.Person@Bench.test ');
    await user.type(within(form).getByLabelText('Name'), 'New Person');
    await user.selectOptions(within(form).getByLabelText('Role'), 'editor');
    await user.click(within(form).getByRole('button', { name: 'Send the invitation' }));
    expect(await within(form).findByText(/New Person \(new\.person@bench\.test\) is invited as Editor\./)).toBeTruthy();
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ email: 'new.person@bench.test', displayName: 'New Person', role: 'editor' });

    answer = errorAnswer(409, 'email_taken', 'Taken') as typeof answer;
    await user.type(within(form).getByLabelText('E-mail'), 'ada@bench.test');
    await user.type(within(form).getByLabelText('Name'), 'Ada');
    await user.click(within(form).getByRole('button', { name: 'Send the invitation' }));
    expect(await within(form).findByText('A staff account with this e-mail already exists.')).toBeTruthy();
  });

  it('lists pending invitations and withdraws one', async () => {
    const { calls } = adminApi({
      'GET /api/admin/invitations': { body: { invitations: [invitation] } },
      'POST /api/admin/invitations/inv-1/revoke': { body: { invitation: { ...invitation, status: 'revoked' } } },
    });
    const { user } = renderApp('/lab/admin/users');
    const table = await screen.findByRole('table', { name: 'Staff invitations' });
    expect(within(table).getByText('new.person@bench.test')).toBeTruthy();
    await user.click(within(table).getByRole('button', { name: 'Withdraw the invitation of new.person@bench.test' }));
    expect(calls.some((c) => c.method === 'POST' && c.path === '/api/admin/invitations/inv-1/revoke')).toBe(true);
  });
});
