import { ROLE_LABELS } from '#shared/auth/capabilities.ts';
import type { Invitation } from '#shared/schemas/invitations.ts';
import { Button } from '#src/components/button.tsx';
import { SaveError } from '#src/components/save-error.tsx';
import { formatDate } from '#src/lib/format.ts';
import { useRevokeInvitation } from '../api/invitations.ts';

const STATUS = { pending: 'Waiting', accepted: 'Accepted', revoked: 'Withdrawn' } as const;

export function InvitationsTable({ invitations }: { invitations: readonly Invitation[] }) {
  const revoke = useRevokeInvitation();
  if (invitations.length === 0) return <p className="text-ink-soft">No invitations yet.</p>;
  return (
    <div className="space-y-3">
      <SaveError error={revoke.error} what="Withdrawing the invitation" />
      <table className="w-full border-collapse font-sans text-sm">
        <caption className="sr-only">Staff invitations</caption>
        <thead>
          <tr className="border-b border-rule text-left">
            <th scope="col" className="py-2 pr-4">E-mail</th>
            <th scope="col" className="py-2 pr-4">Name</th>
            <th scope="col" className="py-2 pr-4">Role</th>
            <th scope="col" className="py-2 pr-4">Status</th>
            <th scope="col" className="py-2 pr-4">Sent</th>
            <th scope="col" className="py-2"><span className="sr-only">Actions</span></th>
          </tr>
        </thead>
        <tbody>
          {invitations.map((i) => {
            const expired = i.status === 'pending' && new Date(i.expiresAt) <= new Date();
            return (
              <tr key={i.id} className="border-b border-rule">
                <td className="py-2 pr-4">{i.email}</td>
                <td className="py-2 pr-4">{i.displayName}</td>
                <td className="py-2 pr-4">{ROLE_LABELS[i.role]}</td>
                <td className="py-2 pr-4">{expired ? 'Expired' : STATUS[i.status]}{i.status === 'pending' && !expired ? ` (until ${formatDate(i.expiresAt)})` : ''}</td>
                <td className="py-2 pr-4">{formatDate(i.createdAt)}{i.invitedBy ? ` by ${i.invitedBy}` : ''}</td>
                <td className="py-2 text-right">
                  {i.status === 'pending' ? (
                    <Button size="sm" variant="danger" onClick={() => revoke.mutate(i.id)} pending={revoke.isPending && revoke.variables === i.id} aria-label={`Withdraw the invitation of ${i.email}`}>
                      Withdraw
                    </Button>
                  ) : null}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
