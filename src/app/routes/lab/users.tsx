import type { QueryClient } from '@tanstack/react-query';
import { can } from '#shared/auth/capabilities.ts';
import { Card } from '#src/components/card.tsx';
import { ErrorState } from '#src/components/error-state.tsx';
import { PageHeader } from '#src/components/page-header.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { CreateUserForm } from '#src/features/users/components/create-user-form.tsx';
import { UsersTable } from '#src/features/users/components/users-table.tsx';
import { usersQueryOptions, useUsers } from '#src/features/users/api/get-users.ts';
import { meQueryOptions, useMe } from '#src/features/auth/api/get-me.ts';

/** Starts loading the list while the page's code arrives; only for roles that may see it. */
export const clientLoader = (queryClient: QueryClient) => async () => {
  const { user } = await queryClient.ensureQueryData(meQueryOptions());
  if (user && can(user.role, 'users.manage')) void queryClient.prefetchQuery(usersQueryOptions());
  return null;
};

function UsersPage() {
  const me = useMe();
  const users = useUsers();
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
          <CreateUserForm />
        </Card>
      </div>
    </>
  );
}

export default UsersPage;
