import { describe, expect, it } from 'vitest';
import { importSpectrum } from './spectrum-import.ts';

// Behaviour checks of the importer's own rules (which column, which unit, which row is dropped);
// numeric conversions name their source beside them.
const codes = (text: string, unit?: string) => importSpectrum(text, { unit }).issues.map((i) => [i.code, i.line]);

describe('importSpectrum', () => {
  it('returns ascending Float64Arrays in W·m⁻²·nm⁻¹ and the preamble as metadata', () => {
    // 100 µW/cm²/nm = 1 W/m²/nm (SI prefixes, BIPM SI Brochure 9th ed. 2019)
    const r = importSpectrum('Instrument: DS-1\nSerial;DS1-7;;\nWavelength (nm);Irradiance (µW/cm²/nm)\n601;-5\n600;100\n');
    expect(r.ok).toBe(true);
    expect(r.unit).toBe('uW/cm2/nm');
    expect(r.metadata).toEqual({ Instrument: 'DS-1', Serial: 'DS1-7' });
    expect(r.spectrum!.wavelengthNm).toEqual(Float64Array.of(600, 601));
    expect(r.spectrum!.irradianceWm2Nm).toEqual(Float64Array.of(1, -0.05));
  });

  it("uses the caller's unit over the file's and says so", () => {
    // 1 mW/cm²/nm = 10 W/m²/nm (SI prefixes, BIPM SI Brochure 9th ed. 2019)
    const r = importSpectrum('Wavelength (nm),Irradiance (W/m2/nm)\n600,1\n601,2\n', { unit: 'mW/cm2/nm' });
    expect(r.unit).toBe('mW/cm2/nm');
    expect(r.spectrum!.irradianceWm2Nm).toEqual(Float64Array.of(10, 20));
    expect(r.issues.map((i) => i.code)).toEqual(['unit_overridden']);
  });

  it('rejects an unknown unit from the caller', () => {
    expect(codes('Wavelength,Irradiance\n600,1\n601,1\n', 'furlongs')).toEqual([['unknown_unit', null]]);
  });

  it('asks for a unit when none is anywhere, in words that name no caller\'s option', () => {
    const r = importSpectrum('Wavelength,Irradiance\n600,1\n601,1\n');
    expect(r.ok).toBe(false);
    expect(r.issues[0].code).toBe('no_unit');
    // Each caller adds its own hint (the CLI its --unit, the page its unit picker).
    expect(r.issues[0].message).not.toMatch(/--/);
    expect(r.issues[0].message).toMatch(/Name it in the header/);
  });

  it("with unitPolicy 'if-missing' uses the caller's unit only when the file names none", () => {
    // 1 mW/cm²/nm = 10 W/m²/nm (SI prefixes, BIPM SI Brochure 9th ed. 2019)
    const named = importSpectrum('Wavelength (nm),Irradiance (W/m2/nm)\n600,1\n601,2\n', { unit: 'mW/cm2/nm', unitPolicy: 'if-missing' });
    expect(named.unit).toBe('W/m2/nm');
    expect(named.unitSource).toBe('file');
    expect(named.issues).toEqual([]);
    expect(named.spectrum!.irradianceWm2Nm).toEqual(Float64Array.of(1, 2));
    const bare = importSpectrum('Wavelength (nm),Irradiance\n600,1\n601,2\n', { unit: 'mW/cm2/nm', unitPolicy: 'if-missing' });
    expect(bare.unit).toBe('mW/cm2/nm');
    expect(bare.unitSource).toBe('caller');
    expect(bare.spectrum!.irradianceWm2Nm).toEqual(Float64Array.of(10, 20));
  });

  it('finds the unit on any preamble line, keeps reading metadata after it, and skips readings', () => {
    const r = importSpectrum('Integrated irradiance: 24.1 W/m2\nUnits: uW/cm2/nm\nOperator: A\nWavelength,Value\n600,1\n601,1\n');
    expect(r.unit).toBe('uW/cm2/nm');
    expect(r.metadata).toMatchObject({ Units: 'uW/cm2/nm', Operator: 'A' });
    expect(importSpectrum('Spectral irradiance in W/m2/nm\nWavelength,Value\n600,1\n601,1\n').unit).toBe('W/m2/nm');
    expect(importSpectrum('Integrated irradiance: 24.1 W/m2\nWavelength,Value\n600,1\n601,1\n').issues[0].code).toBe('no_unit');
  });

  it('prefers the header unit to the preamble unit and warns', () => {
    const r = importSpectrum('Units: uW/cm2/nm\nWavelength,Irradiance (W/m2/nm)\n600,1\n601,1\n');
    expect(r.unit).toBe('W/m2/nm');
    expect(r.issues.map((i) => i.code)).toEqual(['unit_conflict']);
  });

  it('says a radiance column is radiance, not merely "not per nanometre"', () => {
    const r = importSpectrum('Wavelength (nm),Radiance (W/m2/sr/nm)\n600,1\n601,1\n');
    expect(r.issues.map((i) => i.code)).toEqual(['unit_not_spectral']);
    expect(r.issues[0].message).toMatch(/steradian/);
  });

  it('takes a header written as a comment only when the rows have as many columns', () => {
    const commented = importSpectrum('# pixel wavelength_nm irradiance_W_m2_nm\n0 600 1\n1 601 2\n');
    expect(Array.from(commented.spectrum!.wavelengthNm)).toEqual([600, 601]);
    const note = importSpectrum('Units: W/m2/nm\n# Wavelength calibration factory\n600 1\n601 2\n');
    expect(note.issues.map((i) => i.code)).toEqual(['no_header']);
    const under = importSpectrum('Wavelength (nm),Irradiance (W/m2/nm)\n# Wavelength calibration, factory\n600,1\n601,2\n');
    expect(under.ok).toBe(true);
    expect(under.issues).toEqual([]);
  });

  it('picks the named irradiance column among counts and reference columns', () => {
    const r = importSpectrum('nm\tRaw counts\tReference\tDark\tIrradiance (W/m2/nm)\tStd\n600\t5\t6\t7\t0.5\t9\n601\t5\t6\t7\t0.25\t9\n');
    expect(Array.from(r.spectrum!.irradianceWm2Nm)).toEqual([0.5, 0.25]);
  });

  it('refuses UTF-16 text that was read as UTF-8', () => {
    const text = Array.from('Wavelength,Irradiance (W/m2/nm)\n600,1\n', (c) => `${c}\0`).join('');
    expect(codes(`\ufffd\ufffd${text}`)).toEqual([['utf16', null]]);
  });

  it('refuses a file with NUL bytes as not text', () => {
    expect(codes('Wavelength,E (W/m2/nm)\n600,1\0\n601,1\n')).toEqual([['not_text', null]]);
  });

  it('refuses a zip-like binary (e.g. a spreadsheet workbook) as not text, not as UTF-16', () => {
    expect(codes('PK\u0003\u0004\u0014\u0000\u0006\u0000\b\u0000\u0000\u0000!\u0000b\u00ee\u009dh^\u0001\u0000\u0000')).toEqual([['not_text', null]]);
  });

  it('reads decimal commas inside quoted cells of a comma-separated file', () => {
    const r = importSpectrum('"Wavelength (nm)","Irradiance (W/m2/nm)"\n"600,5","0,0123"\n"601,5","0,0124"\n');
    expect(Array.from(r.spectrum!.wavelengthNm)).toEqual([600.5, 601.5]);
    expect(Array.from(r.spectrum!.irradianceWm2Nm)).toEqual([0.0123, 0.0124]);
  });

  it('lists at most 20 issues of one code and counts the rest', () => {
    const good = Array.from({ length: 60 }, (_, i) => `${600 + i},1`).join('\n');
    const bad = Array.from({ length: 25 }, (_, i) => `${700 + i},x`).join('\n');
    const r = importSpectrum(`Wavelength,E (W/m2/nm)\n${good}\n${bad}\n`);
    expect(r.ok).toBe(true);
    expect(r.issues.filter((i) => i.code === 'non_numeric_row')).toHaveLength(20);
    expect(r.issues.at(-1)).toMatchObject({ code: 'more_issues', line: null });
    expect(r.issues.at(-1)!.message).toMatch(/^5 more/);
  });

  it('reads a formula-like cell as a bad row, never as a value', () => {
    expect(codes('Wavelength,E (W/m2/nm)\n600,1\n601,@SUM(A1)\n602,1\n603,1\n')).toEqual([['formula_cell', 3]]);
  });

  it('keeps the first of two rows with the same wavelength', () => {
    const r = importSpectrum('Wavelength,E (W/m2/nm)\n601,1\n600,2\n601,3\n');
    expect(Array.from(r.spectrum!.irradianceWm2Nm)).toEqual([2, 1]);
    expect(r.issues.map((i) => [i.code, i.line])).toEqual([
      ['repeated_wavelength', 4],
      ['unsorted_wavelengths', null],
    ]);
  });

  it('converts a wavelength column labelled in ångström', () => {
    // 1 Å = 0.1 nm (BIPM SI Brochure 8th ed. 2006, Table 8, non-SI units)
    const r = importSpectrum('Wavelength (Å),E (W/m2/nm)\n6000,1\n6010,1\n');
    expect(Array.from(r.spectrum!.wavelengthNm)).toEqual([600, 601]);
  });

  it('never throws on junk', () => {
    for (const junk of ['\ufeff', ',,,', '"', '"""\n"', 'a;b\n1;2', 'λ;E (W/m2/nm)\n1e400;1\n', '\r\r\r', 'nm,W/m2/nm\n600,\n']) {
      expect(() => importSpectrum(junk)).not.toThrow();
      expect(importSpectrum(junk).ok).toBe(false);
    }
  });
});
