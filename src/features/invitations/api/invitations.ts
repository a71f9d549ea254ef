import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { invitationListSchema, invitationResponseSchema, type CreateInvitationBody, type Invitation } from '#shared/schemas/invitations.ts';
import { api } from '#src/lib/api-client.ts';

export const invitationsQueryKey = ['admin', 'invitations'] as const;

/** GET /api/admin/invitations (admins): pending first. */
export async function getInvitations(signal?: AbortSignal): Promise<Invitation[]> {
  return (await api.get('/api/admin/invitations', invitationListSchema, signal)).invitations;
}

export function invitationsQueryOptions() {
  return queryOptions({ queryKey: invitationsQueryKey, queryFn: ({ signal }) => getInvitations(signal) });
}

export function useInvitations() {
  return useQuery(invitationsQueryOptions());
}

/** POST /api/admin/invitations { email, displayName, role }: 201 | 409 email_taken. */
export async function createInvitation(body: CreateInvitationBody): Promise<Invitation> {
  return (await api.post('/api/admin/invitations', body, invitationResponseSchema)).invitation;
}

export function useCreateInvitation() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createInvitation, onSettled: () => queryClient.invalidateQueries({ queryKey: invitationsQueryKey }) });
}

/** POST /api/admin/invitations/:id/revoke. */
export async function revokeInvitation(id: string): Promise<Invitation> {
  return (await api.post(`/api/admin/invitations/${encodeURIComponent(id)}/revoke`, {}, invitationResponseSchema)).invitation;
}

export function useRevokeInvitation() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: revokeInvitation, onSettled: () => queryClient.invalidateQueries({ queryKey: invitationsQueryKey }) });
}
