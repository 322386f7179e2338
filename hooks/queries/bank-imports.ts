import { useMutation, useQueryClient } from '@tanstack/react-query';

import { type BankMatchRequest, bankMatchResponseSchema } from '@/shared/schemas/bank-import';
import { type PaymentCreate, statementSchema } from '@/shared/schemas/statement';

import { apiRequest } from '../api-client';

/** A bank statement's credits paired with the statements they seem to pay; nothing recorded. */
export function useBankMatchMutation() {
  return useMutation({
    mutationFn: (request: BankMatchRequest) =>
      apiRequest('/api/bank-imports/matches', {
        method: 'POST',
        body: request,
        schema: bankMatchResponseSchema,
      }),
  });
}

/** A matched credit confirmed by the maker: recorded as a payment of its statement. */
export function useConfirmBankPaymentMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ statementId, payment }: { statementId: number; payment: PaymentCreate }) =>
      apiRequest(`/api/statements/${statementId}/payments`, {
        method: 'POST',
        body: payment,
        schema: statementSchema,
      }),
    onSuccess: () =>
      queryClient.invalidateQueries({
        predicate: (q) =>
          ['statements', 'consignments', 'overview'].includes(String(q.queryKey[0])),
      }),
  });
}
