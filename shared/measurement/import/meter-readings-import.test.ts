import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { importMeterReadings } from './meter-readings-import.ts';

const dir = fileURLToPath(new URL('../../../tests/fixtures/meter-readings', import.meta.url));
const read = (file: string) => importMeterReadings(readFileSync(join(dir, file), 'utf8'));
const problems = (file: string) => read(file).issues.map((i) => [i.code, i.line, i.severity]);

describe('importMeterReadings on the fixture corpus', () => {
  // Expected values are the numbers written into the fixtures by generate-meter-readings.ts.
  it.each([
    'template-comma.csv',
    'semicolon-decimal-comma-bom-crlf.csv',
    'tab-blank-lines.tsv',
    'header-caret-units.csv',
    'header-exponent-units.csv',
  ])('%s: 8 readings', (file) => {
    const r = read(file);
    expect(r.ok).toBe(true);
    expect(r.issues).toEqual([]);
    expect(r.readings).toHaveLength(8);
    expect(r.readings.map(({ line: _line, ...rest }) => rest)).toContainEqual({ distanceCm: 30, xCm: 10, yCm: 5, irradianceMwCm2: 49.5 });
    expect(r.readings[1]).toMatchObject({ distanceCm: 15, xCm: 0, yCm: 5, irradianceMwCm2: 117.5 });
  });

  it('gives each reading its line in the file', () => {
    expect(read('semicolon-decimal-comma-bom-crlf.csv').readings.map((r) => r.line)).toEqual([5, 6, 7, 8, 9, 10, 11, 12]);
    expect(read('tab-blank-lines.tsv').readings.map((r) => r.line)).toEqual([3, 5, 7, 9, 11, 13, 15, 17]);
  });

  it('drops bad rows with a located warning', () => {
    const r = read('bad-rows.csv');
    expect(r.ok).toBe(true);
    expect(r.readings).toHaveLength(6);
    expect(problems('bad-rows.csv')).toEqual([
      ['non_numeric_row', 3, 'warning'],
      ['missing_value', 4, 'warning'],
      ['duplicate_point', 5, 'warning'],
      ['negative_distance', 6, 'warning'],
      ['formula_cell', 7, 'warning'],
    ]);
  });

  it.each([
    ['missing-column.csv', [['missing_column', 1, 'error']]],
    ['empty.csv', [['empty_file', null, 'error']]],
    ['header-only.csv', [['no_data', null, 'error']]],
    ['not-the-template.csv', [['no_header', null, 'error']]],
    ['mostly-bad-rows.csv', [['non_numeric_row', 3, 'warning'], ['missing_value', 4, 'warning'], ['too_many_bad_rows', null, 'error']]],
  ])('%s is rejected', (file, issues) => {
    const r = read(file);
    expect(r.ok).toBe(false);
    expect(r.readings).toEqual([]);
    expect(problems(file)).toEqual(issues);
  });
});

describe('importMeterReadings', () => {
  it('keeps a negative irradiance (meter offset) with a warning', () => {
    const r = importMeterReadings('distance_cm,x_cm,y_cm,irradiance_mw_cm2\n15,0,0,-0.02\n15,1,0,3\n');
    expect(r.ok).toBe(true);
    expect(r.readings[0].irradianceMwCm2).toBe(-0.02);
    expect(r.issues.map((i) => [i.code, i.line])).toEqual([['negative_irradiance', 2]]);
  });
  it('reads quoted decimal commas in a comma-separated file', () => {
    const r = importMeterReadings('distance_cm,x_cm,y_cm,irradiance_mw_cm2\n"15","0","0","12,5"\n');
    expect(r.readings[0].irradianceMwCm2).toBe(12.5);
  });
  it('accepts headers with spaces and units in brackets', () => {
    const r = importMeterReadings('Distance (cm),X (cm),Y (cm),Irradiance (mW/cm²)\n15,0,0,12\n');
    expect(r.readings).toEqual([{ distanceCm: 15, xCm: 0, yCm: 0, irradianceMwCm2: 12, line: 2 }]);
  });
});
