import { useMemo, useRef, useState } from 'react';
import type { DecodedText } from '#shared/measurement/import/decode-text.ts';
import { checkSpectrum, type SpectrumCheck } from '../utils/check-spectrum.ts';
import { useReadFiles, type ReadFile } from './use-read-files.ts';

export interface SpectrumFileCheck {
  file: ReadFile;
  /** Null while reading or when the bytes could not be read. */
  check: SpectrumCheck | null;
}

/**
 * Spectrum files and their checks. Changing the fallback unit re-runs the import of every file;
 * results are cached per decoded text and unit, so adding a file does not redo the others.
 */
export function useSpectrumChecks() {
  const { files, add, clear } = useReadFiles();
  const [unitIfMissing, setUnitIfMissing] = useState('');
  const cache = useRef(new WeakMap<DecodedText, Map<string, SpectrumCheck>>());

  const checks = useMemo<SpectrumFileCheck[]>(
    () =>
      files.map((file) => {
        if (!file.decoded) return { file, check: null };
        let byUnit = cache.current.get(file.decoded);
        if (!byUnit) {
          byUnit = new Map();
          cache.current.set(file.decoded, byUnit);
        }
        let check = byUnit.get(unitIfMissing);
        if (!check) {
          check = checkSpectrum(file.decoded, unitIfMissing);
          byUnit.set(unitIfMissing, check);
        }
        return { file, check };
      }),
    [files, unitIfMissing],
  );

  return { checks, add, clear, unitIfMissing, setUnitIfMissing };
}
