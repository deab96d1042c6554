import { authToken } from '../../../lib/auth-token.js';
import type { SheetPreviewRow, SheetProblem } from './types.js';

export type SheetUploadAnswer =
  | { ok: true; imported: number; unchanged: number; dryRun: boolean; rows: SheetPreviewRow[] }
  | { ok: false; problems: SheetProblem[]; message: string };

/**
 * POSTs a results sheet to the import route with the upload's progress reported (fetch cannot
 * report upload progress; XMLHttpRequest can). A 422 answer is a list of problems, not a failure.
 */
export function uploadSheet(meetId: string, file: File, options: { dryRun: boolean; onProgress?(fraction: number): void }): Promise<SheetUploadAnswer> {
  return new Promise((resolve, reject) => {
    const request = new XMLHttpRequest();
    request.open('POST', `/api/meets/${encodeURIComponent(meetId)}/results/import${options.dryRun ? '?dryRun=true' : ''}`);
    const token = authToken.get();
    if (token) request.setRequestHeader('authorization', `Bearer ${token}`);
    request.upload.onprogress = (event) => {
      if (event.lengthComputable) options.onProgress?.(event.loaded / event.total);
    };
    request.onerror = () => reject(new Error("Endgrain's server could not be reached. Check your connection and try again."));
    request.onload = () => {
      let body: Record<string, unknown> = {};
      try {
        body = JSON.parse(request.responseText) as Record<string, unknown>;
      } catch {
        // An answer that is not JSON is reported below by its status.
      }
      if (request.status === 200) {
        resolve({ ok: true, ...(body as Omit<Extract<SheetUploadAnswer, { ok: true }>, 'ok'>) });
      } else if (request.status === 422) {
        const problems = Array.isArray(body['errors']) ? (body['errors'] as SheetProblem[]) : [];
        const message = typeof body['message'] === 'string' ? body['message'] : 'The sheet was refused.';
        resolve({ ok: false, problems: problems.length ? problems : [{ row: 0, column: 'file', message }], message });
      } else {
        reject(new Error(typeof body['message'] === 'string' ? body['message'] : `The upload failed (${request.status}).`));
      }
    };
    const form = new FormData();
    form.append('file', file);
    request.send(form);
  });
}
