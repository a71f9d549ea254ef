import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  sessionUserSchema,
  type SessionUser,
  type SignInBody,
} from '#shared/schemas/users.ts';
import { api } from '#src/lib/api-client.ts';
import { meQueryKey } from './get-me.ts';

const signInResponseSchema = z.object({ user: sessionUserSchema });

/** POST /api/auth/sign-in: sets the session cookie and answers with the user. */
export async function signIn(body: SignInBody): Promise<SessionUser> {
  const { user } = await api.post('/api/auth/sign-in', body, signInResponseSchema);
  return user;
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: async (user) => {
      // Seed `me` so the lab guard lets the user through at once, then mark it for a fresh read.
      queryClient.setQueryData(meQueryKey, { user });
      await queryClient.invalidateQueries({ queryKey: meQueryKey });
    },
  });
}
