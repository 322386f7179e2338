import { useQuery } from '@tanstack/react-query';

import { venuePieceSchema } from '@/shared/schemas/consignment';
import { venueHomeSchema } from '@/shared/schemas/venue-side';

import { apiRequest } from '../api-client';
import { staleTimes } from '../query-config';

export const venueHomeKeys = {
  all: ['venue-home'] as const,
  detail: () => [...venueHomeKeys.all, 'detail'] as const,
  piece: (lineId: number) => [...venueHomeKeys.all, 'piece', lineId] as const,
};

export function useVenueHomeQuery() {
  return useQuery({
    queryKey: venueHomeKeys.detail(),
    queryFn: ({ signal }) =>
      apiRequest('/api/venue/consignments', { schema: venueHomeSchema, signal }),
    staleTime: staleTimes.venueHome,
  });
}

/** One piece the venue holds: what a shelf label's QR code opens. */
export function useVenuePieceQuery(lineId: number) {
  return useQuery({
    queryKey: venueHomeKeys.piece(lineId),
    queryFn: ({ signal }) =>
      apiRequest(`/api/venue/lines/${lineId}`, { schema: venuePieceSchema, signal }),
    staleTime: staleTimes.venueHome,
  });
}
