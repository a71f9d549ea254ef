import { MAX_INSTRUMENT_FILE_BYTES } from '../measurement/check/limits.ts';

/** What one upload to a run may hold; the server refuses more (413), the page warns first. */
export const UPLOAD_LIMITS = {
  fileBytes: MAX_INSTRUMENT_FILE_BYTES,
  files: 2000,
  batchBytes: 200 * 1024 * 1024,
} as const;
