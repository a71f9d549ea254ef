/**
 * The reader's choice of units, kept for the visit and across visits (localStorage): irradiance in
 * mW/cm² (the trade's) or W/m² (SI), lengths in cm or inches. Figures are stored in mW/cm² and cm;
 * these helpers convert with shared/measurement/units.ts and format as src/lib/format.ts does.
 */
import { createContext, useCallback, useContext, useEffect, useMemo, useState, type ReactNode } from 'react';
import { cmToInch, mwCm2ToWm2 } from '#shared/measurement/units.ts';
import { formatFigure, formatLength } from './format.ts';

export type IrradianceUnit = 'mW/cm²' | 'W/m²';
export type LengthUnit = 'cm' | 'in';

export interface DisplayUnits {
  irradiance: IrradianceUnit;
  length: LengthUnit;
}

const DEFAULT_UNITS: DisplayUnits = { irradiance: 'mW/cm²', length: 'cm' };
const STORAGE_KEY = 'benchlight.units';

interface DisplayUnitsValue extends DisplayUnits {
  setUnits: (units: Partial<DisplayUnits>) => void;
  /** An irradiance given in mW/cm², in the chosen unit. */
  irradianceValue: (mwCm2: number) => number;
  /** "82.5 mW/cm²" or "825 W/m²". */
  formatIrradiance: (mwCm2: number | null | undefined) => string;
  /** A length given in cm, in the chosen unit. */
  lengthValue: (cm: number) => number;
  /** "30 cm" or "11.8 in". */
  formatLength: (cm: number | null | undefined) => string;
  /** An area given in cm², as "1,630 cm²" or "253 in²". */
  formatArea: (cm2: number | null | undefined) => string;
}

function read(): DisplayUnits {
  try {
    const saved = JSON.parse(globalThis.localStorage?.getItem(STORAGE_KEY) ?? 'null') as Partial<DisplayUnits> | null;
    return {
      irradiance: saved?.irradiance === 'W/m²' ? 'W/m²' : 'mW/cm²',
      length: saved?.length === 'in' ? 'in' : 'cm',
    };
  } catch {
    return DEFAULT_UNITS;
  }
}

const DisplayUnitsContext = createContext<DisplayUnitsValue | null>(null);

export function DisplayUnitsProvider({ children }: { children: ReactNode }) {
  const [units, setState] = useState<DisplayUnits>(DEFAULT_UNITS);
  useEffect(() => setState(read()), []);
  const setUnits = useCallback((next: Partial<DisplayUnits>) => {
    setState((current) => {
      const merged = { ...current, ...next };
      try {
        globalThis.localStorage?.setItem(STORAGE_KEY, JSON.stringify(merged));
      } catch {
        // Private browsing: the choice lasts for this page only.
      }
      return merged;
    });
  }, []);
  const value = useMemo<DisplayUnitsValue>(() => {
    const irradianceValue = (mwCm2: number) => (units.irradiance === 'W/m²' ? mwCm2ToWm2(mwCm2) : mwCm2);
    const lengthValue = (cm: number) => (units.length === 'in' ? cmToInch(cm) : cm);
    return {
      ...units,
      setUnits,
      irradianceValue,
      formatIrradiance: (v) => (v === null || v === undefined || !Number.isFinite(v) ? '—' : `${formatFigure(irradianceValue(v))} ${units.irradiance}`),
      lengthValue,
      formatLength: (v) => (v === null || v === undefined || !Number.isFinite(v) ? '—' : `${formatLength(lengthValue(v))} ${units.length}`),
      formatArea: (v) => {
        if (v === null || v === undefined || !Number.isFinite(v)) return '—';
        return units.length === 'in' ? `${formatFigure(v / (2.54 * 2.54))} in²` : `${formatFigure(v)} cm²`;
      },
    };
  }, [units, setUnits]);
  return <DisplayUnitsContext.Provider value={value}>{children}</DisplayUnitsContext.Provider>;
}

/** The reader's units; outside a provider, the defaults (mW/cm², cm). */
export function useDisplayUnits(): DisplayUnitsValue {
  const value = useContext(DisplayUnitsContext);
  if (value) return value;
  const irradianceValue = (v: number) => v;
  const lengthValue = (v: number) => v;
  return {
    ...DEFAULT_UNITS,
    setUnits: () => {},
    irradianceValue,
    formatIrradiance: (v) => (v === null || v === undefined || !Number.isFinite(v) ? '—' : `${formatFigure(v)} mW/cm²`),
    lengthValue,
    formatLength: (v) => (v === null || v === undefined || !Number.isFinite(v) ? '—' : `${formatLength(v)} cm`),
    formatArea: (v) => (v === null || v === undefined || !Number.isFinite(v) ? '—' : `${formatFigure(v)} cm²`),
  };
}
