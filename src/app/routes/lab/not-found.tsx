import { NotFound } from '#src/components/not-found.tsx';

export default function LabNotFoundRoute() {
  return <NotFound homeTo="/lab" homeLabel="Go to lab home" />;
}
