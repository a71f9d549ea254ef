import { PageHeader } from '#src/components/page-header.tsx';
import { useMe } from '#src/features/auth/api/get-me.ts';
import { RoleOverview } from '#src/features/lab-home/components/role-overview.tsx';

export default function OverviewRoute() {
  const { data } = useMe();
  const user = data?.user;
  if (!user) return null;
  return (
    <>
      <PageHeader eyebrow="Lab" title={`Welcome, ${user.displayName}`} />
      <RoleOverview role={user.role} />
    </>
  );
}
