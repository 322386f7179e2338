import { useQuery } from '@tanstack/react-query';

import { venueHomeSchema } from '@/shared/schemas/overview';

import { apiRequest } from '../api-client';
import { staleTimes } from '../query-config';

export const venueHomeKeys = {
  all: ['venue-home'] as const,
  detail: () => [...venueHomeKeys.all, 'detail'] as const,
};

export function useVenueHomeQuery() {
  return useQuery({
    queryKey: venueHomeKeys.detail(),
    queryFn: ({ signal }) =>
      apiRequest('/api/venue/consignments', { schema: venueHomeSchema, signal }),
    staleTime: staleTimes.venueHome,
  });
}
