import { useCallback, useRef, useState } from 'react';
import { sizeIssue } from '#shared/measurement/check/limits.ts';

export interface ReadFile {
  key: string;
  name: string;
  sizeBytes: number;
  state: 'reading' | 'read' | 'failed';
  bytes: Uint8Array | null;
  /** Why the bytes could not be read (the importer's own problems come later, as issues). */
  failure: string | null;
}

/**
 * Files picked or dropped, read as bytes in the browser. Nothing leaves the page. A file over
 * the instrument-file limit is not read at all. `single` keeps only the latest file.
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
          bytes: null,
          failure: null,
        } satisfies ReadFile,
      }));
      setFiles((current) => [...(single ? [] : current), ...entries.map((e) => e.entry)]);
      for (const { file, entry } of entries) {
        const tooLarge = sizeIssue(file.size);
        if (tooLarge) {
          update(entry.key, { state: 'failed', failure: tooLarge.message });
          continue;
        }
        file
          .arrayBuffer()
          .then((buffer) => update(entry.key, { state: 'read', bytes: new Uint8Array(buffer) }))
          .catch(() => update(entry.key, { state: 'failed', failure: 'The browser could not read this file. Pick it again.' }));
      }
    },
    [single, update],
  );

  const clear = useCallback(() => setFiles([]), []);

  return { files, add, clear };
}
