/**
 * Text of demo spectrum exports in four shapes met on the bench, plus the lab's own
 * meter-readings template. Pure: each function returns the file's text.
 */
import type { DemoInstrument, ExportFormat } from './catalog.ts';

export interface SpectrumExportInput {
  instrument: DemoInstrument;
  wavelengthsNm: readonly number[];
  /** Spectral irradiance, W/m²/nm, one per wavelength. */
  spectralWm2nm: readonly number[];
  distanceCm: number;
  xCm: number;
  yCm: number;
  /** Local date-time, e.g. 2025-03-04 09:30:20. */
  takenAt: string;
  integrationMs: number;
  /** Dark and raw detector counts, for the format that writes them. */
  darkCounts?: readonly number[];
  rawCounts?: readonly number[];
}

/** The irradiance unit each format writes, as spelled in its header. */
export const FORMAT_UNIT: Readonly<Record<ExportFormat, string>> = {
  'comma-preamble': 'W/m2/nm',
  'semicolon-decimal-comma': 'µW/cm²/nm',
  'tab-counts-descending': 'mW/m2/nm',
  'comma-bom': 'W/(m²·nm)',
};

/** Canonical form of that unit (the importer's spelling) and its factor to W/m²/nm. */
export const FORMAT_UNIT_CANONICAL: Readonly<Record<ExportFormat, { canonical: string; toWm2nm: number }>> = {
  'comma-preamble': { canonical: 'W/m2/nm', toWm2nm: 1 },
  'semicolon-decimal-comma': { canonical: 'uW/cm2/nm', toWm2nm: 0.01 },
  'tab-counts-descending': { canonical: 'mW/m2/nm', toWm2nm: 1e-3 },
  'comma-bom': { canonical: 'W/m2/nm', toWm2nm: 1 },
};

export const FORMAT_EXTENSION: Readonly<Record<ExportFormat, string>> = {
  'comma-preamble': 'csv',
  'semicolon-decimal-comma': 'csv',
  'tab-counts-descending': 'txt',
  'comma-bom': 'csv',
};

/** Fixed decimals without a "-0.000" artefact. */
function fixed(value: number, digits: number): string {
  const text = value.toFixed(digits);
  return text.charCodeAt(0) === 45 && Number(text) === 0 ? text.slice(1) : text;
}

function commaPreamble(e: SpectrumExportInput): string {
  const lines = [
    'Spectral irradiance export',
    `Instrument: ${e.instrument.maker} ${e.instrument.model}`,
    `Serial number: ${e.instrument.serial}`,
    `Calibration date: ${e.instrument.calibrationDate}`,
    `Measured: ${e.takenAt}`,
    `Integration time (ms): ${e.integrationMs}`,
    'Scans averaged: 5',
    'Dark corrected: yes',
    `Position: x ${e.xCm} cm / y ${e.yCm} cm / distance ${e.distanceCm} cm`,
    '',
    'Wavelength (nm),Irradiance (W/m2/nm)',
  ];
  e.wavelengthsNm.forEach((wl, i) => lines.push(`${fixed(wl, 1)},${fixed(e.spectralWm2nm[i], 6)}`));
  return lines.join('\n') + '\n';
}

function semicolonDecimalComma(e: SpectrumExportInput): string {
  const dec = (v: number, digits: number) => fixed(v, digits).replace('.', ',');
  const lines = [
    `Device;${e.instrument.maker} ${e.instrument.model}`,
    `Serial number;${e.instrument.serial}`,
    `Calibration;${e.instrument.calibrationDate}`,
    `Date;${e.takenAt}`,
    `Integration time [ms];${e.integrationMs}`,
    `Distance [cm];${e.distanceCm}`,
    `Position x [cm];${e.xCm}`,
    `Position y [cm];${e.yCm}`,
    'Unit;µW/cm²/nm',
    '',
    'Wavelength [nm];Irradiance [µW/cm²/nm]',
  ];
  // 1 W/m²/nm = 100 µW/cm²/nm (SI prefixes).
  e.wavelengthsNm.forEach((wl, i) => lines.push(`${dec(wl, 1)};${dec(e.spectralWm2nm[i] * 100, 4)}`));
  return lines.join('\r\n') + '\r\n';
}

function tabCountsDescending(e: SpectrumExportInput): string {
  const lines = [
    `# instrument: ${e.instrument.maker} ${e.instrument.model}`,
    `# serial_number: ${e.instrument.serial}`,
    `# calibration_date: ${e.instrument.calibrationDate}`,
    `# acquired: ${e.takenAt}`,
    `# integration_time_ms: ${e.integrationMs}`,
    `# distance_cm: ${e.distanceCm}`,
    `# x_cm: ${e.xCm}`,
    `# y_cm: ${e.yCm}`,
    'wavelength_nm\tdark_counts\traw_counts\tirradiance_mW_m2_nm',
  ];
  for (let i = e.wavelengthsNm.length - 1; i >= 0; i--) {
    const dark = e.darkCounts?.[i] ?? 0;
    const raw = e.rawCounts?.[i] ?? 0;
    lines.push(`${fixed(e.wavelengthsNm[i], 3)}\t${dark}\t${raw}\t${fixed(e.spectralWm2nm[i] * 1000, 3)}`);
  }
  return lines.join('\n') + '\n';
}

function commaBom(e: SpectrumExportInput): string {
  const lines = [
    `${e.instrument.maker} ${e.instrument.model} spectral irradiance`,
    `Serial: ${e.instrument.serial}`,
    `Calibrated: ${e.instrument.calibrationDate}`,
    `Timestamp: ${e.takenAt}`,
    `Exposure (ms): ${e.integrationMs}`,
    `Distance (cm): ${e.distanceCm}`,
    `X (cm): ${e.xCm}`,
    `Y (cm): ${e.yCm}`,
    'Wavelength (nm),Spectral irradiance (W/(m²·nm))',
  ];
  e.wavelengthsNm.forEach((wl, i) => lines.push(`${fixed(wl, 2)},${fixed(e.spectralWm2nm[i], 6)}`));
  return '\uFEFF' + lines.join('\n') + '\n';
}

export function formatSpectrumExport(format: ExportFormat, input: SpectrumExportInput): string {
  switch (format) {
    case 'comma-preamble':
      return commaPreamble(input);
    case 'semicolon-decimal-comma':
      return semicolonDecimalComma(input);
    case 'tab-counts-descending':
      return tabCountsDescending(input);
    case 'comma-bom':
      return commaBom(input);
  }
}

export interface MeterReadingRow {
  distanceCm: number;
  xCm: number;
  yCm: number;
  irradianceMwCm2: number;
}

/** The lab's meter-readings template: one row per grid point, all planes of one run. */
export function formatMeterReadings(rows: readonly MeterReadingRow[]): string {
  const lines = ['distance_cm,x_cm,y_cm,irradiance_mw_cm2'];
  for (const r of rows) lines.push(`${r.distanceCm},${r.xCm},${r.yCm},${fixed(r.irradianceMwCm2, 2)}`);
  return lines.join('\n') + '\n';
}
