/**
 * Configuration (view) factor from a small receiver to a uniform Lambertian rectangle parallel
 * to it (Howell's catalogue of configuration factors, case B-3; Siegel & Howell, Thermal
 * Radiation Heat Transfer). Irradiance at the receiver = exitance of the rectangle × factor.
 * The factor is dimensionless: lengths may be in any one unit.
 */

/**
 * Receiver on the normal through one corner of an a × b rectangle at distance c:
 * F = (1/2π)[X/√(1+X²)·atan(Y/√(1+X²)) + Y/√(1+Y²)·atan(X/√(1+Y²))], X = a/c, Y = b/c.
 * a, b, c in one length unit; a or b of 0 gives 0.
 */
export function cornerViewFactor(a: number, b: number, c: number): number {
  if (!(c > 0)) throw new RangeError(`distance must be positive, got ${c}`);
  if (a < 0 || b < 0) throw new RangeError('rectangle sides must not be negative');
  const x = a / c;
  const y = b / c;
  const sx = Math.sqrt(1 + x * x);
  const sy = Math.sqrt(1 + y * y);
  return ((x / sx) * Math.atan(y / sx) + (y / sy) * Math.atan(x / sy)) / (2 * Math.PI);
}

/** Signed corner term: G(u, v) = sgn(u)·sgn(v)·F(|u|, |v|, c). */
function signedCorner(u: number, v: number, c: number): number {
  return Math.sign(u) * Math.sign(v) * cornerViewFactor(Math.abs(u), Math.abs(v), c);
}

/** Edges of a rectangle measured from the foot of the receiver's normal, signed, one length unit. */
export interface RectangleEdges {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

/**
 * Any receiver position: split the rectangle at the receiver's foot and add the signed corner
 * terms, F = G(X₁,Y₁) − G(X₀,Y₁) − G(X₁,Y₀) + G(X₀,Y₀). Works inside, on and outside the
 * rectangle's projection. Edges and distance in one length unit.
 */
export function rectangleViewFactor(edges: RectangleEdges, distance: number): number {
  const { x0, x1, y0, y1 } = edges;
  if (!(x1 >= x0 && y1 >= y0)) throw new RangeError('rectangle edges must satisfy x0 ≤ x1 and y0 ≤ y1');
  return (
    signedCorner(x1, y1, distance) -
    signedCorner(x0, y1, distance) -
    signedCorner(x1, y0, distance) +
    signedCorner(x0, y0, distance)
  );
}

/** A W × H emitting area centred on the origin (x along the width), cm. */
export interface PanelSizeCm {
  widthCm: number;
  heightCm: number;
}

/** Receiver at (xCm, yCm) in front of a centred panel, distanceCm from its plane. */
export function panelViewFactor(
  panel: PanelSizeCm,
  receiver: { xCm: number; yCm: number; distanceCm: number },
): number {
  const { widthCm, heightCm } = panel;
  const { xCm, yCm, distanceCm } = receiver;
  return rectangleViewFactor(
    { x0: -widthCm / 2 - xCm, x1: widthCm / 2 - xCm, y0: -heightCm / 2 - yCm, y1: heightCm / 2 - yCm },
    distanceCm,
  );
}
