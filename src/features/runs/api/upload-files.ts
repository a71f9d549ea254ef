import { errorBodySchema } from '#shared/errors.ts';
import { uploadResultSchema, type UploadResult } from '#shared/schemas/runs.ts';
import { ApiError } from '#src/lib/api-client.ts';

export interface UploadProgress {
  loadedBytes: number;
  totalBytes: number;
}

/**
 * POST /api/lab/runs/:id/files (multipart: `files` repeated, optional `manifest`) → 202
 * { accepted, unmatched, duplicates }. XMLHttpRequest rather than fetch: only it reports how far
 * the upload has gone, which the progress bar shows.
 */
export function uploadRunFiles(
  runId: string,
  files: readonly File[],
  manifest: File | null,
  onProgress: (p: UploadProgress) => void,
  signal?: AbortSignal,
): Promise<UploadResult> {
  const form = new FormData();
  for (const f of files) form.append('files', f, f.name);
  if (manifest) form.append('manifest', manifest, manifest.name);
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/lab/runs/${encodeURIComponent(runId)}/files`);
    xhr.responseType = 'text';
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (e) => onProgress({ loadedBytes: e.loaded, totalBytes: e.lengthComputable ? e.total : 0 });
    signal?.addEventListener('abort', () => xhr.abort());
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
    xhr.onerror = () =>
      reject(new ApiError({ code: 'network_error', status: 0, message: "The upload could not reach the server. Check the connection and try again." }));
    xhr.onload = () => {
      let json: unknown;
      try {
        json = JSON.parse(xhr.responseText || 'null');
      } catch {
        json = null;
      }
      if (xhr.status === 202 || xhr.status === 200) {
        const parsed = uploadResultSchema.safeParse(json);
        if (parsed.success) return resolve(parsed.data);
        return reject(new ApiError({ code: 'bad_response', status: xhr.status, message: 'The server sent an answer this page does not understand.' }));
      }
      const error = errorBodySchema.safeParse(json);
      if (error.success) {
        const { code, message, details } = error.data.error;
        return reject(new ApiError({ code, status: xhr.status, message, details }));
      }
      reject(new ApiError({ code: xhr.status >= 500 ? 'server_unavailable' : `http_${xhr.status}`, status: xhr.status, message: `The server answered ${xhr.status}.` }));
    };
    xhr.send(form);
  });
}
