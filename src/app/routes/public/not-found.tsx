import { NotFound } from '../../../components/not-found.tsx';

export default function PublicNotFoundRoute() {
  return <NotFound />;
}
