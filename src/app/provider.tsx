import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { DisplayUnitsProvider } from '../lib/display-units.tsx';

export function AppProvider({ queryClient, children }: { queryClient: QueryClient; children: ReactNode }) {
  return (
    <QueryClientProvider client={queryClient}>
      <DisplayUnitsProvider>{children}</DisplayUnitsProvider>
    </QueryClientProvider>
  );
}
