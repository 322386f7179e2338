import { type QueryClient, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import {
  type VenueCreateParsed,
  venueDetailSchema,
  venueListSchema,
  venueSchema,
  type VenueUpdateParsed,
} from '@/shared/schemas/venue';

import { apiRequest } from '../api-client';
import { staleTimes } from '../query-config';
import { overviewKeys } from './overview';
import { workKeys } from './works';

export const venueKeys = {
  all: ['venues'] as const,
  lists: () => [...venueKeys.all, 'list'] as const,
  list: () => [...venueKeys.lists(), 'all'] as const,
  details: () => [...venueKeys.all, 'detail'] as const,
  detail: (id: number) => [...venueKeys.details(), id] as const,
};

async function invalidateVenues(queryClient: QueryClient, id?: number) {
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: venueKeys.lists() }),
    queryClient.invalidateQueries({ queryKey: workKeys.facets() }),
    queryClient.invalidateQueries({ queryKey: overviewKeys.all }),
    id === undefined ? null : queryClient.invalidateQueries({ queryKey: venueKeys.detail(id) }),
  ]);
}

export function useVenuesQuery() {
  return useQuery({
    queryKey: venueKeys.list(),
    queryFn: ({ signal }) => apiRequest('/api/venues', { schema: venueListSchema, signal }),
    staleTime: staleTimes.venues,
  });
}

export function useVenueQuery(id: number) {
  return useQuery({
    queryKey: venueKeys.detail(id),
    queryFn: ({ signal }) => apiRequest(`/api/venues/${id}`, { schema: venueDetailSchema, signal }),
    staleTime: staleTimes.venues,
  });
}

export function useVenueCreateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (values: VenueCreateParsed) =>
      apiRequest('/api/venues', { method: 'POST', body: values, schema: venueSchema }),
    onSuccess: () => invalidateVenues(queryClient),
  });
}

export function useVenueUpdateMutation(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (values: VenueUpdateParsed) =>
      apiRequest(`/api/venues/${id}`, { method: 'PATCH', body: values, schema: venueSchema }),
    onSuccess: () => invalidateVenues(queryClient, id),
  });
}
