import { RouterProvider } from 'react-router-dom';
import { AppProvider } from './provider.tsx';
import { createAppQueryClient } from './query-client.ts';
import { createAppRouter } from './router.tsx';

const queryClient = createAppQueryClient();
const router = createAppRouter(queryClient);

export function App() {
  return (
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>
  );
}
