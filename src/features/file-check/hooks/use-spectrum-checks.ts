import { useMemo, useRef, useState } from 'react';
import type { SpectrumFileCheck } from '#shared/measurement/check/check-spectrum-file.ts';
import { checkSpectrumOnPage } from '../utils/page-checks.ts';
import { useReadFiles, type ReadFile } from './use-read-files.ts';

export interface SpectrumFileItem {
  file: ReadFile;
  /** Null while reading or when the bytes could not be read. */
  check: SpectrumFileCheck | null;
}

/**
 * Spectrum files and their checks. Changing the fallback unit re-runs every file's check;
 * results are cached per file's bytes and unit, so adding a file does not redo the others.
 */
export function useSpectrumChecks() {
  const { files, add, clear } = useReadFiles();
  const [unitIfMissing, setUnitIfMissing] = useState('');
  const cache = useRef(new WeakMap<Uint8Array, Map<string, SpectrumFileCheck>>());

  const checks = useMemo<SpectrumFileItem[]>(
    () =>
      files.map((file) => {
        if (!file.bytes) return { file, check: null };
        let byUnit = cache.current.get(file.bytes);
        if (!byUnit) {
          byUnit = new Map();
          cache.current.set(file.bytes, byUnit);
        }
        let check = byUnit.get(unitIfMissing);
        if (!check) {
          check = checkSpectrumOnPage(file.bytes, unitIfMissing);
          byUnit.set(unitIfMissing, check);
        }
        return { file, check };
      }),
    [files, unitIfMissing],
  );

  return { checks, add, clear, unitIfMissing, setUnitIfMissing };
}
