import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { calendarFeedSchema } from '@/shared/schemas/calendar';

import { apiRequest } from '../api-client';
import { staleTimes } from '../query-config';

export const calendarKeys = { feed: ['calendar-feed'] as const };

/** Whether the studio has a private calendar address (its address is shown only when made). */
export function useCalendarFeedQuery() {
  return useQuery({
    queryKey: calendarKeys.feed,
    queryFn: ({ signal }) =>
      apiRequest('/api/calendar-feed', { schema: calendarFeedSchema, signal }),
    staleTime: staleTimes.studio,
  });
}

/** Makes a new address (the old one stops working), or stops the address. */
export function useCalendarFeedMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (action: 'make' | 'stop') =>
      apiRequest('/api/calendar-feed', {
        method: action === 'make' ? 'POST' : 'DELETE',
        ...(action === 'make' ? { body: {} } : {}),
        schema: calendarFeedSchema,
      }),
    onSuccess: (feed) => queryClient.setQueryData(calendarKeys.feed, { ...feed, url: null }),
  });
}
