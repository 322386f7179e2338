import {
  keepPreviousData,
  type QueryClient,
  useMutation,
  useQuery,
  useQueryClient,
} from '@tanstack/react-query';

import {
  type WorkCreateParsed,
  type WorkExportQuery,
  workFacetsSchema,
  type WorkListQuery,
  workListSchema,
  workPhotosSchema,
  workSchema,
  type WorkUpdateParsed,
} from '@/shared/schemas/work';
import { workHistorySchema } from '@/shared/schemas/work-history';
import {
  workImportPreviewSchema,
  type WorkImportRequest,
  workImportResultSchema,
} from '@/shared/schemas/work-import';

import { apiRequest } from '../api-client';
import { ApiError } from '../api-errors';
import { type ChosenFile } from '../chosen-file';
import { staleTimes } from '../query-config';
import { uploadFiles, type UploadProgress } from '../upload';
import { overviewKeys } from './overview';
import { queryString } from './query-string';
import { studioKeys } from './studio';

export const workKeys = {
  all: ['works'] as const,
  lists: () => [...workKeys.all, 'list'] as const,
  list: (query: WorkListQuery) => [...workKeys.lists(), query] as const,
  facets: () => [...workKeys.all, 'facets'] as const,
  details: () => [...workKeys.all, 'detail'] as const,
  detail: (id: number) => [...workKeys.details(), id] as const,
  history: (id: number) => [...workKeys.detail(id), 'history'] as const,
};

/** A change to works can change lists, filters, the overview and the next stock number. */
async function invalidateWorks(queryClient: QueryClient, id?: number) {
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: workKeys.lists() }),
    queryClient.invalidateQueries({ queryKey: workKeys.facets() }),
    queryClient.invalidateQueries({ queryKey: overviewKeys.all }),
    queryClient.invalidateQueries({ queryKey: studioKeys.settings() }),
    id === undefined ? null : queryClient.invalidateQueries({ queryKey: workKeys.detail(id) }),
  ]);
}

export function useWorksQuery(query: WorkListQuery) {
  return useQuery({
    queryKey: workKeys.list(query),
    queryFn: ({ signal }) =>
      apiRequest(`/api/works${queryString(query)}`, { schema: workListSchema, signal }),
    staleTime: staleTimes.works,
    // Keep the last page on screen while the next sort, filter or page loads.
    placeholderData: keepPreviousData,
  });
}

export function useWorkFacetsQuery() {
  return useQuery({
    queryKey: workKeys.facets(),
    queryFn: ({ signal }) => apiRequest('/api/works/facets', { schema: workFacetsSchema, signal }),
    staleTime: staleTimes.workFacets,
  });
}

export function useWorkQuery(id: number) {
  return useQuery({
    queryKey: workKeys.detail(id),
    queryFn: ({ signal }) => apiRequest(`/api/works/${id}`, { schema: workSchema, signal }),
    staleTime: staleTimes.works,
  });
}

export function useWorkHistoryQuery(id: number) {
  return useQuery({
    queryKey: workKeys.history(id),
    queryFn: ({ signal }) =>
      apiRequest(`/api/works/${id}/history`, { schema: workHistorySchema, signal }),
    staleTime: staleTimes.works,
  });
}

export function useWorkCreateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (values: WorkCreateParsed) =>
      apiRequest('/api/works', { method: 'POST', body: values, schema: workSchema }),
    onSuccess: async (work) => {
      queryClient.setQueryData(workKeys.detail(work.id), work);
      await invalidateWorks(queryClient);
    },
  });
}

export function useWorkUpdateMutation(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (values: WorkUpdateParsed) =>
      apiRequest(`/api/works/${id}`, { method: 'PATCH', body: values, schema: workSchema }),
    onSuccess: async (work) => {
      queryClient.setQueryData(workKeys.detail(id), work);
      await invalidateWorks(queryClient, id);
    },
  });
}

export function useWorkArchiveMutation(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (action: 'archive' | 'restore') =>
      apiRequest(`/api/works/${id}/${action}`, { method: 'POST', body: {} }),
    onSuccess: () => invalidateWorks(queryClient, id),
  });
}

export function useWorkDeleteMutation(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiRequest(`/api/works/${id}`, { method: 'DELETE' }),
    onSuccess: async () => {
      queryClient.removeQueries({ queryKey: workKeys.detail(id) });
      await invalidateWorks(queryClient);
    },
  });
}

export type PhotoUpload = {
  workId: number;
  files: readonly ChosenFile[];
  onProgress?: (p: UploadProgress) => void;
};

/** Sends several photos at once; progress covers the whole request. */
function uploadWorkPhotos({ workId, files, onProgress }: PhotoUpload) {
  return uploadFiles(`/api/works/${workId}/photos`, 'photos', files, onProgress).then((body) => {
    const parsed = workPhotosSchema.safeParse(body);
    if (!parsed.success) throw new ApiError(201, 'unexpected_response', '');
    return parsed.data;
  });
}

/** Photos for any work, the one just created included; its page then shows them. */
export function usePhotoUploadMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadWorkPhotos,
    onSuccess: (_photos, { workId }) => invalidateWorks(queryClient, workId),
  });
}

export function usePhotoOrderMutation(workId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (photoIds: number[]) =>
      apiRequest(`/api/works/${workId}/photos/order`, { method: 'PUT', body: { photoIds } }),
    onSuccess: () => invalidateWorks(queryClient, workId),
  });
}

export function usePhotoDeleteMutation(workId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (photoId: number) =>
      apiRequest(`/api/works/${workId}/photos/${photoId}`, { method: 'DELETE' }),
    onSuccess: () => invalidateWorks(queryClient, workId),
  });
}

export function useWorkImportPreviewMutation() {
  return useMutation({
    mutationFn: (request: Omit<WorkImportRequest, 'mode'>) =>
      apiRequest('/api/works/import', {
        method: 'POST',
        body: { ...request, mode: 'preview' },
        schema: workImportPreviewSchema,
      }),
  });
}

export function useWorkImportCommitMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: Omit<WorkImportRequest, 'mode'>) =>
      apiRequest('/api/works/import', {
        method: 'POST',
        body: { ...request, mode: 'commit' },
        schema: workImportResultSchema,
      }),
    onSuccess: () => invalidateWorks(queryClient),
  });
}

/** Every column an import reads and an example row, downloaded by the browser. */
export const workImportTemplatePath = '/api/works/import/template.csv';

/**
 * The catalogue as CSV, with the list's search, filters and sort but not its paging, downloaded by
 * the browser with the session cookie.
 */
export function worksExportPath(query: WorkExportQuery): string {
  return `/api/works/export.csv${queryString(query)}`;
}
