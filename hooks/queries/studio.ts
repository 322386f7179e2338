import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { studioSettingsSchema, type StudioSettingsUpdate } from '@/shared/schemas/studio';

import { apiRequest } from '../api-client';
import { staleTimes } from '../query-config';

export const studioKeys = {
  all: ['studio'] as const,
  settings: () => [...studioKeys.all, 'settings'] as const,
};

/** The studio's settings: currency, stock-number pattern, price step and the next stock number. */
export function useStudioQuery() {
  return useQuery({
    queryKey: studioKeys.settings(),
    queryFn: ({ signal }) => apiRequest('/api/studio', { schema: studioSettingsSchema, signal }),
    staleTime: staleTimes.studio,
  });
}

export function useStudioUpdateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (values: StudioSettingsUpdate) =>
      apiRequest('/api/studio', { method: 'PATCH', body: values, schema: studioSettingsSchema }),
    onSuccess: (settings) => {
      queryClient.setQueryData(studioKeys.settings(), settings);
    },
  });
}
