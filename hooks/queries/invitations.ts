import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { type InvitationAccept, invitationSummarySchema } from '@/shared/schemas/invitation';

import { apiRequest } from '../api-client';
import { staleTimes } from '../query-config';
import { sessionKeys } from '../session';
import { queryString } from './query-string';

export const invitationKeys = {
  all: ['invitations'] as const,
  detail: (token: string) => [...invitationKeys.all, token] as const,
};

export function useInvitationQuery(token: string) {
  return useQuery({
    queryKey: invitationKeys.detail(token),
    queryFn: ({ signal }) =>
      apiRequest(`/api/invitations/lookup${queryString({ token })}`, {
        schema: invitationSummarySchema,
        signal,
      }),
    staleTime: staleTimes.invitations,
  });
}

/** Accepting signs the person in: everything cached belongs to whoever was here before. */
export function useInvitationAcceptMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: InvitationAccept) =>
      apiRequest('/api/invitations/accept', { method: 'POST', body }),
    onSuccess: async () => {
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== sessionKeys.all[0] });
      await queryClient.invalidateQueries({ queryKey: sessionKeys.all, refetchType: 'all' });
    },
  });
}
