import { useQuery } from '@tanstack/react-query';

import { overviewSchema } from '@/shared/schemas/overview';

import { apiRequest } from '../api-client';
import { staleTimes } from '../query-config';

export const overviewKeys = {
  all: ['overview'] as const,
  detail: () => [...overviewKeys.all, 'detail'] as const,
};

export function useOverviewQuery() {
  return useQuery({
    queryKey: overviewKeys.detail(),
    queryFn: ({ signal }) => apiRequest('/api/overview', { schema: overviewSchema, signal }),
    staleTime: staleTimes.overview,
  });
}
