import { NotYetBuilt } from '#src/components/not-yet-built.tsx';

export default function SubscribeRoute() {
  return (
    <NotYetBuilt
      title="Subscribe"
      willHold="a form to get an e-mail whenever a new report is published, with a choice of topics and a one-click unsubscribe in every message."
    />
  );
}
