import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import {
  type OutboxListQuery,
  outboxListSchema,
  type OutboxMessage,
  outboxMessageSchema,
} from '@/shared/schemas/outbox';

import { apiRequest } from '../api-client';
import { staleTimes } from '../query-config';
import { queryString } from './query-string';

export const outboxKeys = {
  all: ['outbox'] as const,
  lists: () => [...outboxKeys.all, 'list'] as const,
  list: (query: OutboxListQuery) => [...outboxKeys.lists(), query] as const,
  details: () => [...outboxKeys.all, 'detail'] as const,
  detail: (id: number) => [...outboxKeys.details(), id] as const,
};

/** How often a page showing mail still waiting to go asks again, until it has gone or failed. */
const waitingRefetchMs = 3000;
const isWaiting = (message: Pick<OutboxMessage, 'state'>) => message.state === 'queued';

export function useOutboxQuery(query: OutboxListQuery) {
  return useQuery({
    queryKey: outboxKeys.list(query),
    queryFn: ({ signal }) =>
      apiRequest(`/api/outbox${queryString(query)}`, { schema: outboxListSchema, signal }),
    staleTime: staleTimes.outbox,
    placeholderData: keepPreviousData,
    refetchInterval: (q) => (q.state.data?.items.some(isWaiting) ? waitingRefetchMs : false),
  });
}

export function useOutboxMessageQuery(id: number) {
  return useQuery({
    queryKey: outboxKeys.detail(id),
    queryFn: ({ signal }) =>
      apiRequest(`/api/outbox/${id}`, { schema: outboxMessageSchema, signal }),
    staleTime: staleTimes.outbox,
    refetchInterval: (q) => (q.state.data && isWaiting(q.state.data) ? waitingRefetchMs : false),
  });
}

/** "Send again": queued at once; the page then follows it until it has gone. */
export function useOutboxRetryMutation(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () =>
      apiRequest(`/api/outbox/${id}/retry`, {
        method: 'POST',
        body: {},
        schema: outboxMessageSchema,
      }),
    onSuccess: async (message) => {
      queryClient.setQueryData(outboxKeys.detail(id), message);
      await queryClient.invalidateQueries({ queryKey: outboxKeys.lists() });
    },
  });
}

/** Where the browser downloads an attachment, rendered afresh by the server. */
export function outboxAttachmentPath(id: number, index: number): `/api/${string}` {
  return `/api/outbox/${id}/attachments/${index}`;
}
