import { ApiError, errorFromResponse } from './api-errors';
import { type ChosenFile } from './chosen-file';

export type UploadProgress = { loaded: number; total: number };

/**
 * Sends files as multipart form data with upload progress, which fetch cannot report. Same
 * origin, the session cookie, and the same typed errors as `apiRequest`.
 */
export function uploadFiles(
  path: `/api/${string}`,
  field: string,
  files: readonly ChosenFile[],
  onProgress?: (progress: UploadProgress) => void,
): Promise<unknown> {
  const form = new FormData();
  for (const chosen of files) {
    if (chosen.file) form.append(field, chosen.file, chosen.name);
    // React Native's FormData takes a { uri, name, type } descriptor in place of a Blob.
    else form.append(field, { uri: chosen.uri, name: chosen.name, type: chosen.mimeType } as never);
  }
  return new Promise((resolve, reject) => {
    const request = new XMLHttpRequest();
    request.open('POST', path);
    request.withCredentials = true;
    request.setRequestHeader('Accept', 'application/json');
    request.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress?.({ loaded: event.loaded, total: event.total });
    };
    request.onerror = () => reject(new ApiError(0, 'network', ''));
    request.onload = () => {
      let body: unknown = undefined;
      try {
        body = request.responseText === '' ? undefined : JSON.parse(request.responseText);
      } catch {
        body = undefined;
      }
      if (request.status >= 200 && request.status < 300) resolve(body);
      else reject(errorFromResponse(request.status, body));
    };
    request.send(form);
  });
}
