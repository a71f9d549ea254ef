import type { QueryClient } from '@tanstack/react-query';
import { can } from '#shared/auth/capabilities.ts';
import { Card } from '#src/components/card.tsx';
import { ErrorState } from '#src/components/error-state.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { InviteForm } from '#src/features/invitations/components/invite-form.tsx';
import { InvitationsTable } from '#src/features/invitations/components/invitations-table.tsx';
import { invitationsQueryOptions, useInvitations } from '#src/features/invitations/api/invitations.ts';
import { UsersTable } from '#src/features/users/components/users-table.tsx';
import { usersQueryOptions, useUsers } from '#src/features/users/api/get-users.ts';
import { meQueryOptions, useMe } from '#src/features/auth/api/get-me.ts';

/** Starts loading the list while the page's code arrives; only for roles that may see it. */
export const clientLoader = (queryClient: QueryClient) => async () => {
  const { user } = await queryClient.ensureQueryData(meQueryOptions());
  if (user && can(user.role, 'users.manage')) {
    void queryClient.prefetchQuery(usersQueryOptions());
    void queryClient.prefetchQuery(invitationsQueryOptions());
  }
  return null;
};

function UsersPage() {
  const me = useMe();
  const users = useUsers();
  const invitations = useInvitations();
  return (
    <>
      <PageHeader
        eyebrow="Lab · Admin"
        title="Users"
        description="Everyone who can sign in to the lab, their role, and whether their account is active."
      />
      <div className="space-y-section">
        {users.isPending ? (
          <Spinner label="Loading staff accounts…" />
        ) : users.isError ? (
          <ErrorState inline title="Staff accounts could not be loaded" error={users.error} onRetry={() => void users.refetch()} />
        ) : (
          <UsersTable users={users.data} currentUserId={me.data?.user?.id} />
        )}
        <Card>
          <InviteForm />
        </Card>
        <section aria-labelledby="invitations-heading" className="space-y-3">
          <h2 id="invitations-heading" className="text-xl font-semibold">
            Invitations
          </h2>
          {invitations.isPending ? (
            <Spinner label="Loading invitations…" />
          ) : invitations.isError ? (
            <ErrorState inline title="Invitations could not be loaded" error={invitations.error} onRetry={() => void invitations.refetch()} />
          ) : (
            <InvitationsTable invitations={invitations.data} />
          )}
        </section>
      </div>
    </>
  );
}

export default UsersPage;
