import { type QueryClient, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import {
  conditionPhotoSchema,
  type ConditionReportCreate,
  conditionReportSchema,
} from '@/shared/schemas/condition';
import {
  type Acknowledge,
  type ConsignmentCreate,
  type ConsignmentListQuery,
  consignmentListSchema,
  consignmentSchema,
  type ConsignmentUpdate,
  type LineCreate,
  type LineUpdate,
} from '@/shared/schemas/consignment';

import { apiRequest } from '../api-client';
import { ApiError } from '../api-errors';
import { type ChosenFile } from '../chosen-file';
import { staleTimes } from '../query-config';
import { uploadFiles } from '../upload';
import { overviewKeys } from './overview';
import { queryString } from './query-string';
import { venueHomeKeys } from './venue-home';
import { venueKeys } from './venues';
import { workKeys } from './works';

export const consignmentKeys = {
  all: ['consignments'] as const,
  lists: () => [...consignmentKeys.all, 'list'] as const,
  list: (query: ConsignmentListQuery) => [...consignmentKeys.lists(), query] as const,
  details: () => [...consignmentKeys.all, 'detail'] as const,
  detail: (id: number) => [...consignmentKeys.details(), id] as const,
};

/**
 * A consignment's change moves its works, the overview, the venue's page, the venue side and its
 * statements (a draft follows the sales; settling moves both).
 */
export async function invalidateConsignments(queryClient: QueryClient, id?: number) {
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: ['statements'] }),
    queryClient.invalidateQueries({ queryKey: consignmentKeys.lists() }),
    queryClient.invalidateQueries({ queryKey: overviewKeys.all }),
    queryClient.invalidateQueries({ queryKey: workKeys.all }),
    queryClient.invalidateQueries({ queryKey: venueKeys.details() }),
    queryClient.invalidateQueries({ queryKey: venueHomeKeys.all }),
    id === undefined
      ? null
      : queryClient.invalidateQueries({ queryKey: consignmentKeys.detail(id) }),
  ]);
}

export function useConsignmentsQuery(query: ConsignmentListQuery) {
  return useQuery({
    queryKey: consignmentKeys.list(query),
    queryFn: ({ signal }) =>
      apiRequest(`/api/consignments${queryString(query)}`, {
        schema: consignmentListSchema,
        signal,
      }),
    staleTime: staleTimes.consignments,
  });
}

export function useConsignmentQuery(id: number) {
  return useQuery({
    queryKey: consignmentKeys.detail(id),
    queryFn: ({ signal }) =>
      apiRequest(`/api/consignments/${id}`, { schema: consignmentSchema, signal }),
    staleTime: staleTimes.consignments,
  });
}

/** Every change answers the whole consignment: it goes straight into the cache. */
function useConsignmentChange<Input>(id: number, send: (input: Input) => Promise<unknown>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: Input) => consignmentSchema.parse(await send(input)),
    onSuccess: async (consignment) => {
      queryClient.setQueryData(consignmentKeys.detail(id), consignment);
      await invalidateConsignments(queryClient, id);
    },
  });
}

export function useConsignmentCreateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (values: ConsignmentCreate) =>
      apiRequest('/api/consignments', { method: 'POST', body: values, schema: consignmentSchema }),
    onSuccess: async (consignment) => {
      queryClient.setQueryData(consignmentKeys.detail(consignment.id), consignment);
      await invalidateConsignments(queryClient);
    },
  });
}

export function useConsignmentUpdateMutation(id: number) {
  return useConsignmentChange(id, (values: ConsignmentUpdate) =>
    apiRequest(`/api/consignments/${id}`, {
      method: 'PATCH',
      body: values,
      schema: consignmentSchema,
    }),
  );
}

export function useLineAddMutation(id: number) {
  return useConsignmentChange(id, (line: LineCreate) =>
    apiRequest(`/api/consignments/${id}/lines`, {
      method: 'POST',
      body: line,
      schema: consignmentSchema,
    }),
  );
}

export function useLinePriceMutation(id: number) {
  return useConsignmentChange(id, ({ lineId, ...body }: LineUpdate & { lineId: number }) =>
    apiRequest(`/api/consignments/${id}/lines/${lineId}`, {
      method: 'PATCH',
      body,
      schema: consignmentSchema,
    }),
  );
}

export function useLineRemoveMutation(id: number) {
  return useConsignmentChange(id, (lineId: number) =>
    apiRequest(`/api/consignments/${id}/lines/${lineId}`, {
      method: 'DELETE',
      schema: consignmentSchema,
    }),
  );
}

/**
 * Agree, dispatch, cancel or close: one step of the consignment's life. Closing is refused (409)
 * while pieces are out, the error's field messages keyed `lines.<lineId>`.
 */
export function useConsignmentStepMutation(id: number) {
  return useConsignmentChange(id, (step: 'agree' | 'dispatch' | 'cancel' | 'close') =>
    apiRequest(`/api/consignments/${id}/${step}`, {
      method: 'POST',
      body: {},
      schema: consignmentSchema,
    }),
  );
}

export function useAcknowledgeMutation(id: number) {
  return useConsignmentChange(id, (body: Acknowledge) =>
    apiRequest(`/api/consignments/${id}/acknowledge`, {
      method: 'POST',
      body,
      schema: consignmentSchema,
    }),
  );
}

/** One piece's condition check; the consignment is fetched again to show it. */
export function useConditionReportMutation(consignmentId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ lineId, ...report }: ConditionReportCreate & { lineId: number }) =>
      apiRequest(`/api/consignment-lines/${lineId}/condition-reports`, {
        method: 'POST',
        body: report,
        schema: conditionReportSchema,
      }),
    onSuccess: () => invalidateConsignments(queryClient, consignmentId),
  });
}

/** A finding's photo, sent before the report that names it. */
export function useConditionPhotoMutation() {
  return useMutation({
    mutationFn: async (file: ChosenFile) => {
      const body = await uploadFiles('/api/condition-photos', 'photo', [file]);
      const parsed = conditionPhotoSchema.safeParse(body);
      if (!parsed.success) throw new ApiError(201, 'unexpected_response', '');
      return parsed.data;
    },
  });
}

/** The PDFs a consignment has, for download links. */
export const consignmentDocumentPaths = (id: number) =>
  ({
    sheet: `/api/consignments/${id}/sheet.pdf`,
    conditionReport: `/api/consignments/${id}/condition-report.pdf`,
    labels: `/api/consignments/${id}/labels.pdf`,
  }) as const;
