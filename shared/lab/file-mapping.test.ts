import { describe, expect, it } from 'vitest';
import { parseManifest, pointFromFileName } from './file-mapping.ts';

const grid = { distancesCm: [15, 30], xCm: [-10, 0, 7.5, 10], yCm: [-5, 0, 5] };

describe('pointFromFileName', () => {
  it('reads d<distance>_x<x>_y<y> in cm, with decimals, negatives and a folder in front', () => {
    // The naming pattern the lab's exports use (common practice, no source).
    expect(pointFromFileName('d30_x-10_y0.csv')).toEqual({ distanceCm: 30, xCm: -10, yCm: 0, slot: 'grid' });
    expect(pointFromFileName('d15_x7.5_y-5.txt')).toEqual({ distanceCm: 15, xCm: 7.5, yCm: -5, slot: 'grid' });
    expect(pointFromFileName('run1/D15_X0_Y0.CSV')).toEqual({ distanceCm: 15, xCm: 0, yCm: 0, slot: 'grid' });
    expect(pointFromFileName('d15_x0_y0_start.csv')).toMatchObject({ slot: 'center_start' });
    expect(pointFromFileName('d15_x0_y0_end.csv')).toMatchObject({ slot: 'center_end' });
  });
  it('refuses anything else', () => {
    for (const n of ['notes.txt', 'd15_x0.csv', 'x0_y0_d15.csv', 'd15_x0_y0', 'd15_xa_y0.csv', 'd15_x0_y0_middle.csv']) expect(pointFromFileName(n)).toBeNull();
  });
});

describe('parseManifest', () => {
  it('maps each file to its point, any column order, slots included', () => {
    const r = parseManifest('\uFEFFy_cm,file,distance_cm,x_cm,slot\n0,a.csv,15,0,\n5,b.csv,30,7.5,grid\n0,c.csv,15,0,start\n', grid);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.entries.get('a.csv')).toEqual({ distanceCm: 15, xCm: 0, yCm: 0, slot: 'grid' });
    expect(r.entries.get('b.csv')).toEqual({ distanceCm: 30, xCm: 7.5, yCm: 5, slot: 'grid' });
    expect(r.entries.get('c.csv')).toEqual({ distanceCm: 15, xCm: 0, yCm: 0, slot: 'center_start' });
  });
  it('rejects the whole manifest with located errors: off-grid points, bad numbers, repeats, missing columns', () => {
    const r = parseManifest('file,distance_cm,x_cm,y_cm\na.csv,15,0,0\nb.csv,45,0,0\nc.csv,15,abc,0\na.csv,30,0,0\n', grid);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.map((e) => [e.line, e.column])).toEqual([[3, null], [4, 'x_cm'], [5, 'file']]);
    const noColumn = parseManifest('file,distance_cm,x_cm\na.csv,15,0\n', grid);
    expect(noColumn.ok).toBe(false);
    if (!noColumn.ok) expect(noColumn.errors[0]).toMatchObject({ line: 1, message: expect.stringMatching(/y_cm/) });
  });
});
