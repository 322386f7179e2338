import { type QueryClient, useMutation, useQueryClient } from '@tanstack/react-query';

import { conditionPhotoSchema } from '@/shared/schemas/condition';
import {
  type Consignment,
  type ConsignmentLine,
  type VenuePiece,
} from '@/shared/schemas/consignment';
import {
  type LineResolve,
  lineResultSchema,
  type SaleBatch,
  saleBatchResultSchema,
  type SaleInput,
  saleResultSchema,
} from '@/shared/schemas/sale';

import { apiRequest } from '../api-client';
import { ApiError } from '../api-errors';
import { type ChosenFile } from '../chosen-file';
import { uploadFiles } from '../upload';
import { consignmentKeys, invalidateConsignments } from './consignments';
import { venueHomeKeys } from './venue-home';

/**
 * Puts a line as the server now has it into every cached page that shows it, so the answer shows
 * at once; the pages are then fetched again for their totals.
 */
function placeLines(queryClient: QueryClient, lines: readonly ConsignmentLine[]) {
  const byId = new Map(lines.map((line) => [line.id, line]));
  const replace = <C extends Pick<Consignment, 'lines'>>(old: C | undefined) =>
    old && old.lines.some((l) => byId.has(l.id))
      ? { ...old, lines: old.lines.map((l) => byId.get(l.id) ?? l) }
      : old;
  queryClient.setQueriesData<Consignment>({ queryKey: consignmentKeys.details() }, replace);
  queryClient.setQueriesData<Consignment>(
    { queryKey: [...venueHomeKeys.all, 'consignment'] },
    replace,
  );
  for (const line of lines) {
    queryClient.setQueryData<VenuePiece>(venueHomeKeys.piece(line.id), (old) =>
      old ? { ...old, line } : old,
    );
  }
}

/**
 * After any answer, good or a refusal: a 409 means someone else got there first (the piece was
 * sold or returned meanwhile), so every page showing it is fetched again.
 */
function useSaleChange<Input, Output>(
  send: (input: Input) => Promise<Output>,
  linesOf: (output: Output) => readonly ConsignmentLine[],
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: async (output) => {
      placeLines(queryClient, linesOf(output));
      await invalidateConsignments(queryClient);
      await queryClient.invalidateQueries({ queryKey: consignmentKeys.details() });
    },
    onError: async (error) => {
      if (error instanceof ApiError && error.status === 409) {
        await invalidateConsignments(queryClient);
        await queryClient.invalidateQueries({ queryKey: consignmentKeys.details() });
      }
    },
  });
}

/** One piece sold, by the venue's staff or by the studio for a venue that phoned it in. */
export function useSaleMutation(lineId: number) {
  return useSaleChange(
    (sale: SaleInput) =>
      apiRequest(`/api/consignment-lines/${lineId}/sale`, {
        method: 'POST',
        body: sale,
        schema: saleResultSchema,
      }),
    (result) => [result.line],
  );
}

/** A sale taken back: the piece is out again. */
export function useUndoSaleMutation(lineId: number) {
  return useSaleChange(
    () =>
      apiRequest(`/api/consignment-lines/${lineId}/sale`, {
        method: 'DELETE',
        schema: lineResultSchema,
      }),
    (result) => [result.line],
  );
}

/** A piece returned to the maker, damaged, lost or (by the studio) withdrawn. */
export function useResolveMutation(lineId: number) {
  return useSaleChange(
    (resolve: LineResolve) =>
      apiRequest(`/api/consignment-lines/${lineId}/resolve`, {
        method: 'POST',
        body: resolve,
        schema: lineResultSchema,
      }),
    (result) => [result.line],
  );
}

/** A till receipt: several pieces of one consignment sold together, all recorded or none. */
export function useSaleBatchMutation(consignmentId: number) {
  return useSaleChange(
    (batch: SaleBatch) =>
      apiRequest(`/api/consignments/${consignmentId}/sales`, {
        method: 'POST',
        body: batch,
        schema: saleBatchResultSchema,
      }),
    (result) => result.sales.map((s) => s.line),
  );
}

/** A photo of damage, sent before the report that names it, in the piece's own studio. */
export function useLinePhotoMutation(lineId: number) {
  return useMutation({
    mutationFn: async (file: ChosenFile) => {
      const body = await uploadFiles(`/api/condition-photos?lineId=${lineId}`, 'photo', [file]);
      const parsed = conditionPhotoSchema.safeParse(body);
      if (!parsed.success) throw new ApiError(201, 'unexpected_response', '');
      return parsed.data;
    },
  });
}
