import { useCallback, useRef, useState } from 'react';
import type { DecodedText } from '#shared/measurement/import/decode-text.ts';
import { decodeFileBytes } from '../utils/check-spectrum.ts';
import { formatBytes } from '../utils/format-figures.ts';

/** Instrument exports are kilobytes; anything this large is not one, and would stall the tab. */
export const MAX_FILE_BYTES = 25 * 1024 * 1024;

export interface ReadFile {
  key: string;
  name: string;
  sizeBytes: number;
  state: 'reading' | 'read' | 'failed';
  decoded: DecodedText | null;
  /** Why the bytes could not be read (the importer's own problems come later, as issues). */
  failure: string | null;
}

/**
 * Files picked or dropped, read as bytes in the browser and decoded to text. Nothing leaves the
 * page. `single` keeps only the latest file (the meter-readings input).
 */
export function useReadFiles({ single = false }: { single?: boolean } = {}) {
  const [files, setFiles] = useState<ReadFile[]>([]);
  const next = useRef(0);

  const update = useCallback((key: string, changes: Partial<ReadFile>) => {
    // A file replaced or cleared while it was being read is dropped, not brought back.
    setFiles((current) => current.map((f) => (f.key === key ? { ...f, ...changes } : f)));
  }, []);

  const add = useCallback(
    (picked: readonly File[]) => {
      const chosen = single ? picked.slice(-1) : picked;
      if (chosen.length === 0) return;
      const entries = chosen.map((file) => ({
        file,
        entry: {
          key: `f${next.current++}`,
          name: file.name,
          sizeBytes: file.size,
          state: 'reading',
          decoded: null,
          failure: null,
        } satisfies ReadFile,
      }));
      setFiles((current) => [...(single ? [] : current), ...entries.map((e) => e.entry)]);
      for (const { file, entry } of entries) {
        if (file.size > MAX_FILE_BYTES) {
          update(entry.key, {
            state: 'failed',
            failure: `The file is ${formatBytes(file.size)}; instrument exports are far smaller, so it was not read.`,
          });
          continue;
        }
        file
          .arrayBuffer()
          .then((buffer) => update(entry.key, { state: 'read', decoded: decodeFileBytes(new Uint8Array(buffer)) }))
          .catch(() =>
            update(entry.key, { state: 'failed', failure: 'The browser could not read this file. Pick it again.' }),
          );
      }
    },
    [single, update],
  );

  const clear = useCallback(() => setFiles([]), []);

  return { files, add, clear };
}
