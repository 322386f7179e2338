import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import {
  type AdjustmentCreate,
  checkoutSchema,
  type PaymentCreate,
  type Statement,
  type StatementCreate,
  statementListSchema,
  statementSchema,
} from '@/shared/schemas/statement';

import { apiRequest } from '../api-client';
import { staleTimes } from '../query-config';
import { invalidateConsignments } from './consignments';
import { yearKeys } from './year';

export const statementKeys = {
  all: ['statements'] as const,
  list: () => [...statementKeys.all, 'list'] as const,
  details: () => [...statementKeys.all, 'detail'] as const,
  detail: (id: number) => [...statementKeys.details(), id] as const,
};

/** The statements the person may see: the studio's, or their venue's issued ones. */
export function useStatementsQuery() {
  return useQuery({
    queryKey: statementKeys.list(),
    queryFn: ({ signal }) => apiRequest('/api/statements', { schema: statementListSchema, signal }),
    staleTime: staleTimes.statements,
  });
}

/**
 * One statement. `until`, when given, asks again every two seconds until it holds (a payment
 * taken online arrives by the provider's webhook moments after the person comes back).
 */
export function useStatementQuery(id: number, until?: (statement: Statement) => boolean) {
  return useQuery({
    queryKey: statementKeys.detail(id),
    queryFn: ({ signal }) =>
      apiRequest(`/api/statements/${id}`, { schema: statementSchema, signal }),
    staleTime: staleTimes.statements,
    refetchInterval: until
      ? (query) => {
          const data = query.state.data;
          return data && until(data) ? false : 2000;
        }
      : undefined,
  });
}

/**
 * Every change answers the whole statement: it goes straight into the cache. Issuing locks sales
 * and settling moves the consignment, so those pages and the year are fetched again too.
 */
function useStatementChange<Input>(send: (input: Input) => Promise<Statement>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: async (statement) => {
      queryClient.setQueryData(statementKeys.detail(statement.id), statement);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: statementKeys.list() }),
        queryClient.invalidateQueries({ queryKey: yearKeys.all }),
        invalidateConsignments(queryClient, statement.consignment?.id),
      ]);
    },
  });
}

/** A draft for a consignment, or for a venue and a period. */
export function useStatementCreateMutation() {
  return useStatementChange((body: StatementCreate) =>
    apiRequest('/api/statements', { method: 'POST', body, schema: statementSchema }),
  );
}

/** Freezes the figures, locks the sales and e-mails the venue. */
export function useStatementIssueMutation(id: number) {
  return useStatementChange(() =>
    apiRequest(`/api/statements/${id}/issue`, {
      method: 'POST',
      body: {},
      schema: statementSchema,
    }),
  );
}

/** A remittance received, recorded by hand. */
export function usePaymentMutation(id: number) {
  return useStatementChange((body: PaymentCreate) =>
    apiRequest(`/api/statements/${id}/payments`, {
      method: 'POST',
      body,
      schema: statementSchema,
    }),
  );
}

/** Part of the difference between the balance and what was paid, explained. */
export function useAdjustmentMutation(id: number) {
  return useStatementChange((body: AdjustmentCreate) =>
    apiRequest(`/api/statements/${id}/adjustments`, {
      method: 'POST',
      body,
      schema: statementSchema,
    }),
  );
}

/** The provider's hosted checkout for the balance: the caller goes there. */
export function useCheckoutMutation(id: number) {
  return useMutation({
    mutationFn: () =>
      apiRequest(`/api/statements/${id}/checkout`, {
        method: 'POST',
        body: {},
        schema: checkoutSchema,
      }),
  });
}

/** The statement's PDF, made from its figures as they stand. */
export const statementPdfPath = (id: number) => `/api/statements/${id}.pdf` as const;

/** The damage claim summary of one returned piece. */
export const claimPdfPath = (lineId: number) =>
  `/api/consignment-lines/${lineId}/claim.pdf` as const;
