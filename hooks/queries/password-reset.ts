import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import {
  type PasswordReset,
  passwordResetLinkSchema,
  type PasswordResetRequest,
  passwordResetRequestedSchema,
} from '@/shared/schemas/password-reset';

import { apiRequest } from '../api-client';
import { staleTimes } from '../query-config';
import { sessionKeys } from '../session';
import { queryString } from './query-string';

export const passwordResetKeys = {
  all: ['password-reset-links'] as const,
  link: (token: string) => [...passwordResetKeys.all, token] as const,
};

/** "Forgot password?": the answer is the same whether or not the address has an account. */
export function usePasswordResetRequestMutation() {
  return useMutation({
    mutationFn: (body: PasswordResetRequest) =>
      apiRequest('/api/auth/request-password-reset', {
        method: 'POST',
        body,
        schema: passwordResetRequestedSchema,
      }),
  });
}

export function usePasswordResetLinkQuery(token: string) {
  return useQuery({
    queryKey: passwordResetKeys.link(token),
    queryFn: ({ signal }) =>
      apiRequest(`/api/auth/reset-password/lookup${queryString({ token })}`, {
        schema: passwordResetLinkSchema,
        signal,
      }),
    staleTime: staleTimes.passwordResetLinks,
  });
}

/** A new password signs the person out everywhere, this browser too if they were signed in. */
export function usePasswordResetMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: PasswordReset) =>
      apiRequest('/api/auth/reset-password', { method: 'POST', body }),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: sessionKeys.all, refetchType: 'all' }),
  });
}
