/**
 * Several identical units switched on together. Irradiance from independent sources adds
 * (superposition), so the field of the set is the sum of one unit's field shifted to each
 * unit's centre. Where a unit's measured grid does not reach a point its share there is not
 * known and counts as zero, so doses there are lower bounds; a point no unit's grid reaches has
 * no value at all.
 */

export interface UnitSizeCm {
  widthCm: number;
  heightCm: number;
}

/** Field at a point, NaN where not measured. */
export type FieldAt = (xCm: number, yCm: number) => number;

/** The summed field of units centred at the given positions. */
export function superposedField(field: FieldAt, centersCm: readonly { xCm: number; yCm: number }[]): FieldAt {
  return (x, y) => {
    let sum = 0;
    let reached = false;
    for (const c of centersCm) {
      const v = field(x - c.xCm, y - c.yCm);
      if (Number.isNaN(v)) continue;
      sum += v;
      reached = true;
    }
    return reached ? sum : NaN;
  };
}

/**
 * Where the units go: the fewest whose emitting areas, edge to edge in a grid, span the target's
 * bounding box, and at least two (a second beside the first along the side the target is
 * longer, relative to the unit, when one already spans it). Centred on the target.
 */
export function unitArrangement(
  target: { widthCm: number; heightCm: number; center: { xCm: number; yCm: number } },
  unit: UnitSizeCm,
): { xCm: number; yCm: number }[] {
  const across = target.widthCm / unit.widthCm;
  const up = target.heightCm / unit.heightCm;
  let nx = Math.max(1, Math.ceil(across - 1e-9));
  let ny = Math.max(1, Math.ceil(up - 1e-9));
  if (nx * ny === 1) {
    if (across >= up) nx = 2;
    else ny = 2;
  }
  const centers: { xCm: number; yCm: number }[] = [];
  for (let b = 0; b < ny; b++) {
    for (let a = 0; a < nx; a++) {
      centers.push({
        xCm: target.center.xCm + (a - (nx - 1) / 2) * unit.widthCm,
        yCm: target.center.yCm + (b - (ny - 1) / 2) * unit.heightCm,
      });
    }
  }
  return centers;
}
