import { keepPreviousData, useQuery } from '@tanstack/react-query';

import { venuePieceSchema } from '@/shared/schemas/consignment';
import {
  venueConsignmentSchema,
  venueHomeSchema,
  venuePiecesSchema,
} from '@/shared/schemas/venue-side';

import { apiRequest } from '../api-client';
import { staleTimes } from '../query-config';
import { queryString } from './query-string';

export const venueHomeKeys = {
  all: ['venue-home'] as const,
  detail: () => [...venueHomeKeys.all, 'detail'] as const,
  pieces: (search: string) => [...venueHomeKeys.all, 'pieces', search] as const,
  consignment: (id: number) => [...venueHomeKeys.all, 'consignment', id] as const,
  piece: (lineId: number) => [...venueHomeKeys.all, 'piece', lineId] as const,
};

/** The consignments of every venue the person works for, from all their studios. */
export function useVenueHomeQuery() {
  return useQuery({
    queryKey: venueHomeKeys.detail(),
    queryFn: ({ signal }) =>
      apiRequest('/api/venue/consignments', { schema: venueHomeSchema, signal }),
    staleTime: staleTimes.venueHome,
  });
}

/** The counter list: pieces out first, searched by stock number or title. */
export function useVenuePiecesQuery(search: string) {
  const q = search.trim();
  return useQuery({
    queryKey: venueHomeKeys.pieces(q),
    queryFn: ({ signal }) =>
      apiRequest(`/api/venue/pieces${queryString({ q })}`, { schema: venuePiecesSchema, signal }),
    staleTime: staleTimes.venueHome,
    // The list stays while the next search runs, so it does not flash empty between keys.
    placeholderData: keepPreviousData,
  });
}

/** One consignment as its venue sees it, in whichever of the person's studios it belongs to. */
export function useVenueConsignmentQuery(id: number) {
  return useQuery({
    queryKey: venueHomeKeys.consignment(id),
    queryFn: ({ signal }) =>
      apiRequest(`/api/venue/consignments/${id}`, { schema: venueConsignmentSchema, signal }),
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
