import { createColumnHelper, tableFeatures, useTable } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { ROLES, ROLE_LABELS, type Role } from '#shared/auth/capabilities.ts';
import type { User } from '#shared/schemas/users.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { Select } from '#src/components/select-field.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { formatDate } from '#src/lib/format.ts';
import { useUpdateUser } from '../api/update-user.ts';

const features = tableFeatures({});
const column = createColumnHelper<typeof features, User>();

const roleOptions = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

type Report = (message: { tone: 'success' | 'error'; text: string }) => void;

const SELF_NOTE_ID = 'users-self-note';

function problem(error: unknown): string {
  if (isApiError(error)) return error.isUnreachable ? "the server can't be reached" : error.message;
  return 'something went wrong';
}

/**
 * The role is chosen first and saved with a button: with the keyboard, a closed select changes
 * value on every arrow key, which must not send a change (and an audit row) per step.
 */
function RoleCell({ user, isSelf, report }: { user: User; isSelf: boolean; report: Report }) {
  const update = useUpdateUser();
  const [draft, setDraft] = useState<Role>(user.role);
  const changed = draft !== user.role;
  const save = () =>
    update.mutate(
      { id: user.id, changes: { role: draft } },
      {
        onSuccess: (u) => report({ tone: 'success', text: `${u.email} is now ${ROLE_LABELS[u.role]}.` }),
        onError: (e) => {
          setDraft(user.role);
          report({ tone: 'error', text: `The role of ${user.email} was not changed: ${problem(e)}.` });
        },
      },
    );
  return (
    <div className="flex flex-wrap items-center gap-2">
      <Select
        aria-label={`Role for ${user.email}`}
        aria-describedby={isSelf ? SELF_NOTE_ID : undefined}
        className="min-w-32"
        options={roleOptions}
        value={draft}
        disabled={isSelf || update.isPending}
        onChange={(event) => setDraft(event.target.value as Role)}
      />
      {changed ? (
        <>
          <Button size="sm" aria-label={`Save role for ${user.email}`} pending={update.isPending} onClick={save}>
            Save
          </Button>
          {!update.isPending ? (
            <Button variant="quiet" size="sm" aria-label={`Keep the role of ${user.email}`} onClick={() => setDraft(user.role)}>
              Cancel
            </Button>
          ) : null}
        </>
      ) : null}
    </div>
  );
}

function AccessCell({ user, isSelf, report }: { user: User; isSelf: boolean; report: Report }) {
  const update = useUpdateUser();
  const [confirming, setConfirming] = useState(false);

  if (isSelf) {
    return (
      <p id={SELF_NOTE_ID} className="max-w-56 font-sans text-xs text-ink-muted">
        This is you. You can't change your own role or deactivate your own account.
      </p>
    );
  }

  const setActive = (active: boolean) =>
    update.mutate(
      { id: user.id, changes: { active } },
      {
        onSuccess: (u) =>
          report({ tone: 'success', text: `${u.email} is ${u.active ? 'active again' : 'deactivated'}.` }),
        onError: (e) =>
          report({
            tone: 'error',
            text: `${user.email} was not ${active ? 'reactivated' : 'deactivated'}: ${problem(e)}.`,
          }),
        onSettled: () => setConfirming(false),
      },
    );

  // The first button keeps its place across states so keyboard focus stays on it.
  if (!user.active) {
    return (
      <div className="flex gap-2">
        <Button
          variant="secondary"
          size="sm"
          aria-label={`Reactivate ${user.email}`}
          pending={update.isPending}
          onClick={() => setActive(true)}
        >
          Reactivate
        </Button>
      </div>
    );
  }
  return (
    <div className="flex gap-2">
      <Button
        variant="danger"
        size="sm"
        aria-label={`${confirming ? 'Confirm deactivate' : 'Deactivate'} ${user.email}`}
        pending={update.isPending}
        onClick={() => (confirming ? setActive(false) : setConfirming(true))}
      >
        {confirming ? 'Confirm deactivate' : 'Deactivate'}
      </Button>
      {confirming && !update.isPending ? (
        <Button variant="quiet" size="sm" aria-label={`Cancel deactivating ${user.email}`} onClick={() => setConfirming(false)}>
          Cancel
        </Button>
      ) : null}
    </div>
  );
}

function buildColumns(currentUserId: string | undefined, report: Report) {
  return column.columns([
    column.accessor('email', { header: 'E-mail' }),
    column.accessor('displayName', { header: 'Name' }),
    column.accessor('role', {
      header: 'Role',
      cell: ({ row }) => (
        <RoleCell user={row.original} isSelf={row.original.id === currentUserId} report={report} />
      ),
    }),
    column.accessor('active', {
      header: 'Status',
      cell: ({ getValue }) =>
        getValue() ? (
          <span className="font-sans text-sm font-semibold text-ok">Active</span>
        ) : (
          <span className="font-sans text-sm font-semibold text-danger">Deactivated</span>
        ),
    }),
    column.accessor('createdAt', {
      header: 'Created',
      cell: ({ getValue }) => <time dateTime={getValue()}>{formatDate(getValue())}</time>,
    }),
    column.display({
      id: 'access',
      header: 'Access',
      cell: ({ row }) => (
        <AccessCell user={row.original} isSelf={row.original.id === currentUserId} report={report} />
      ),
    }),
  ]);
}

/** All staff accounts, with the role and access of each editable in place. */
export function UsersTable({ users, currentUserId }: { users: User[]; currentUserId: string | undefined }) {
  const [message, setMessage] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const columns = useMemo(() => buildColumns(currentUserId, setMessage), [currentUserId]);
  const table = useTable({ features, columns, data: users, getRowId: (u) => u.id });

  return (
    <div className="space-y-4">
      <div aria-live="polite" className="empty:hidden">
        {message ? (
          <Alert tone={message.tone} live={false}>
            {message.text}
          </Alert>
        ) : null}
      </div>
      <div
        role="region"
        aria-labelledby="users-caption"
        tabIndex={0}
        className="overflow-x-auto rounded-md border border-rule bg-paper-raised"
      >
        <table className="w-full border-collapse text-left">
          <caption id="users-caption" className="px-4 pt-3 pb-2 text-left text-lg font-semibold">
            Staff accounts
          </caption>
          <thead className="bg-paper-sunk">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => (
                  <th
                    key={header.id}
                    scope="col"
                    className="bl-label border-y border-rule px-4 py-2 align-bottom"
                  >
                    {header.isPlaceholder ? null : <table.FlexRender header={header} />}
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-rule last:border-b-0 align-middle">
                {row.getAllCells().map((cell) =>
                  cell.column.id === 'email' ? (
                    <th key={cell.id} scope="row" className="px-4 py-3 font-sans text-sm font-semibold">
                      <table.FlexRender cell={cell} />
                    </th>
                  ) : (
                    <td key={cell.id} className="px-4 py-3 text-sm">
                      <table.FlexRender cell={cell} />
                    </td>
                  ),
                )}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
