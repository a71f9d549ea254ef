import { PageHeader } from '../../../components/page-header.tsx';
import { useMe } from '../../../features/auth/api/get-me.ts';
import { RoleOverview } from '../../../features/lab-home/components/role-overview.tsx';

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
