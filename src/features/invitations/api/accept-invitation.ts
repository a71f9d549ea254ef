import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import { acceptedInvitationSchema, invitationPreviewSchema, type AcceptInvitationBody } from '#shared/schemas/invitations.ts';
import { api } from '#src/lib/api-client.ts';

/** POST /api/auth/invitations/preview { token }: who is invited, as what (the token is not used up). */
export async function previewInvitation(token: string) {
  return (await api.post('/api/auth/invitations/preview', { token }, invitationPreviewSchema)).invitation;
}

export function useInvitationPreview(token: string) {
  return useQuery(queryOptions({ queryKey: ['invitation-preview', token], queryFn: () => previewInvitation(token), retry: false }));
}

/** POST /api/auth/invitations/accept { token, password, displayName? }: 201 | 410 | 404. */
export function acceptInvitation(body: AcceptInvitationBody) {
  return api.post('/api/auth/invitations/accept', body, acceptedInvitationSchema);
}

export function useAcceptInvitation() {
  return useMutation({ mutationFn: acceptInvitation });
}
