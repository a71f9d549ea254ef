import { NotFound } from '#src/components/not-found.tsx';

export default function PublicNotFoundRoute() {
  return <NotFound />;
}
