import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can } from '#shared/auth/capabilities.ts';
import { deviceUnitListQuerySchema } from '#shared/schemas/device-units.ts';
import { instrumentListQuerySchema } from '#shared/schemas/instruments.ts';
import { makerListQuerySchema } from '#shared/schemas/makers.ts';
import { modelListQuerySchema } from '#shared/schemas/models.ts';
import { PageHeader } from '#src/components/page-header.tsx';
import { Tabs } from '#src/components/tabs.tsx';
import { meQueryOptions } from '#src/features/auth/api/get-me.ts';
import { deviceUnitsQueryOptions } from '#src/features/device-units/api/get-device-units.ts';
import { DeviceUnitsSection } from '#src/features/device-units/components/device-units-section.tsx';
import { instrumentsQueryOptions } from '#src/features/instruments/api/get-instruments.ts';
import { InstrumentsSection } from '#src/features/instruments/components/instruments-section.tsx';
import { makersQueryOptions } from '#src/features/makers/api/get-makers.ts';
import { MakersSection } from '#src/features/makers/components/makers-section.tsx';
import { modelsQueryOptions } from '#src/features/models/api/get-models.ts';
import { ModelsSection } from '#src/features/models/components/models-section.tsx';
import { readListQuery } from '#src/lib/list-search-params.ts';

const TABS = [
  { id: 'makers', label: 'Makers' },
  { id: 'models', label: 'Models' },
  { id: 'units', label: 'Units' },
  { id: 'instruments', label: 'Instruments' },
] as const;
type CatalogTab = (typeof TABS)[number]['id'];

function tabFrom(params: URLSearchParams): CatalogTab {
  const tab = params.get('tab');
  return TABS.find((t) => t.id === tab)?.id ?? 'makers';
}

/** Loads the open tab's list as the URL has it: the same query, so the table finds it cached. */
function prefetchTab(queryClient: QueryClient, params: URLSearchParams): Promise<void> {
  switch (tabFrom(params)) {
    case 'makers':
      return queryClient.prefetchQuery(makersQueryOptions(readListQuery(params, makerListQuerySchema)));
    case 'models':
      return queryClient.prefetchQuery(modelsQueryOptions(readListQuery(params, modelListQuerySchema)));
    case 'units':
      return queryClient.prefetchQuery(deviceUnitsQueryOptions(readListQuery(params, deviceUnitListQuerySchema)));
    case 'instruments':
      return queryClient.prefetchQuery(instrumentsQueryOptions(readListQuery(params, instrumentListQuerySchema)));
  }
}

/** Starts loading the open tab's list while the page's code arrives; only for roles that may see it. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const { user } = await queryClient.ensureQueryData(meQueryOptions());
    if (user && can(user.role, 'catalog.manage')) void prefetchTab(queryClient, new URL(request.url).searchParams);
    return null;
  };

const SECTIONS: Record<CatalogTab, ComponentType> = {
  makers: MakersSection,
  models: ModelsSection,
  units: DeviceUnitsSection,
  instruments: InstrumentsSection,
};

export default function CatalogRoute() {
  const [params, setParams] = useSearchParams();
  const tab = tabFrom(params);
  const Section = SECTIONS[tab];
  return (
    <>
      <PageHeader
        eyebrow="Lab"
        title="Catalogue"
        description="Makers, their models, the units the lab holds (each with its serial number) and the instruments with their calibration records."
      />
      {/* Another tab starts from its own defaults: one list's search and sort mean nothing to the next. */}
      <Tabs label="Catalogue" tabs={TABS} selected={tab} onSelect={(id) => setParams({ tab: id })}>
        <Section />
      </Tabs>
    </>
  );
}
