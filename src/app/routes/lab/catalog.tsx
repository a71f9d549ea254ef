import { NotYetBuilt } from '#src/components/not-yet-built.tsx';
import { RequireCapability } from '#src/app/require-capability.tsx';

export default function CatalogRoute() {
  return (
    <RequireCapability capability="catalog.manage" action="manage the catalog">
      <NotYetBuilt
        eyebrow="Lab"
        title="Catalog"
        backTo="/lab"
        backLabel="Back to lab home"
        willHold="makers, their models, the units we hold (each with its serial number) and our instruments with their calibration records."
      />
    </RequireCapability>
  );
}
