import { NotYetBuilt } from '#src/components/not-yet-built.tsx';

export default function CatalogRoute() {
  return (
    <>
      <NotYetBuilt
        eyebrow="Lab"
        title="Catalog"
        backTo="/lab"
        backLabel="Back to lab home"
        willHold="makers, their models, the units we hold (each with its serial number) and our instruments with their calibration records."
      />
    </>
  );
}
