import { NotYetBuilt } from '#src/components/not-yet-built.tsx';

export default function RequestRoute() {
  return (
    <NotYetBuilt
      title="Request a test"
      willHold="a form to ask us to test a device, and the list of requests already made, which you can vote for."
    />
  );
}
