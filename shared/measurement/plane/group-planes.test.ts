import { describe, expect, it } from 'vitest';
import { groupPlanesByDistance } from './group-planes.ts';

describe('groupPlanesByDistance', () => {
  it('sorts planes by distance and keeps float noise in one plane', () => {
    const readings = [
      { distanceCm: 30, id: 'a' },
      { distanceCm: 15, id: 'b' },
      { distanceCm: 30.0000000001, id: 'c' },
      { distanceCm: 60, id: 'd' },
    ];
    const planes = groupPlanesByDistance(readings);
    expect(planes.map((p) => p.distanceCm)).toEqual([15, 30, 60]);
    expect(planes[1].readings.map((r) => r.id)).toEqual(['a', 'c']);
  });
});
