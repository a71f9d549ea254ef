import { useMutation } from '@tanstack/react-query';
import { api } from '#src/lib/api-client.ts';

/** POST /api/auth/sign-out (204). The caller leaves the lab and clears the cache. */
export function signOut(): Promise<void> {
  return api.post('/api/auth/sign-out');
}

export function useSignOut() {
  return useMutation({ mutationFn: signOut });
}
