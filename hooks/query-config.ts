import { QueryClient } from '@tanstack/react-query';

import { isRetryable } from './api-errors';

const second = 1000;
const minute = 60 * second;

/** How long each resource counts as fresh before React Query fetches it again. */
export const staleTimes = {
  session: 5 * minute,
  overview: 30 * second,
  venueHome: 30 * second,
  works: 30 * second,
  workFacets: minute,
  venues: minute,
  studio: 5 * minute,
  outbox: 15 * second,
  consignments: 15 * second,
  statements: 15 * second,
  year: minute,
  invitations: 0,
  passwordResetLinks: 0,
} as const;

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        retry: (failureCount, error) => isRetryable(error) && failureCount < 2,
      },
      mutations: { retry: false },
    },
  });
}
