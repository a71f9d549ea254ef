import type { RingCm } from './polygon.ts';

/**
 * Benchlight's own adult front outline for the body overlay: a simple parametric polygon
 * (head, neck, shoulders, torso, hips, optional legs; arms left out because they rarely face a
 * panel) and named zones inside it. Proportions are fractions of standing height (vertical) and
 * of shoulder width (horizontal), chosen as round figures for a plausible adult shape; this is a
 * drawing aid for coverage shares, not anthropometric data.
 *
 * Frame: the panel's, cm, x to the right as seen facing the emitting surface, y up. A person
 * facing the panel has their right side at +x, so "right shoulder" is the +x one.
 */

export type BodyZoneName =
  | 'face'
  | 'neck'
  | 'left-shoulder'
  | 'right-shoulder'
  | 'chest'
  | 'abdomen'
  | 'left-thigh'
  | 'right-thigh';

export interface BodyZone {
  name: BodyZoneName;
  polygon: RingCm;
}

export interface BodyOverlayOptions {
  /** Outer width across the shoulders, cm (default 42). */
  shoulderWidthCm?: number;
  /** Standing height, cm (default 172). */
  heightCm?: number;
  /** Where the torso centre (midline, halfway between shoulder line and hips) sits in the panel frame, cm. */
  offsetCm?: { xCm: number; yCm: number };
  /** Draw the legs to the feet (default true); without them the outline stops below the hips. */
  legs?: boolean;
}

export interface BodyOverlay {
  shoulderWidthCm: number;
  heightCm: number;
  outline: RingCm;
  zones: BodyZone[];
}

/** Heights as fractions of standing height, measured from the soles. */
const H = {
  headCenter: 0.935,
  headHalf: 0.065,
  neckBase: 0.845,
  shoulderTop: 0.8,
  armpit: 0.76,
  chest: 0.72,
  chestLower: 0.67,
  waist: 0.62,
  abdomenLower: 0.55,
  hip: 0.53,
  crotch: 0.47,
  thighTop: 0.45,
  thighLower: 0.32,
  knee: 0.285,
  ankle: 0.04,
} as const;

/** Half-widths as fractions of shoulder width. */
const W = {
  head: 0.19,
  neck: 0.14,
  shoulder: 0.5,
  chest: 0.43,
  waist: 0.36,
  hip: 0.44,
  thigh: 0.42,
  kneeOuter: 0.3,
  kneeInner: 0.05,
  ankleOuter: 0.22,
  footOuter: 0.25,
  footInner: 0.06,
} as const;

/** Torso centre, fraction of height: the anchor placed at offsetCm. */
const TORSO_CENTER = (H.shoulderTop + H.hip) / 2;

type Unit = [number, number]; // [fraction of shoulder width, fraction of height]

/** Ellipse as a polygon, in unit coordinates. */
function ellipse(cx: number, cy: number, rx: number, ry: number, from = 0, to = 2 * Math.PI, n = 24): Unit[] {
  const out: Unit[] = [];
  for (let k = 0; k < n; k++) {
    const t = from + ((to - from) * k) / (n - 1);
    out.push([cx + rx * Math.cos(t), cy + ry * Math.sin(t)]);
  }
  return out;
}

/** Right half of the outline from the top of the head down to the midline at the bottom. */
function rightHalf(legs: boolean): Unit[] {
  // Where the head ellipse meets the neck sides.
  const joinAngle = -Math.asin(Math.sqrt(1 - (W.neck / W.head) ** 2));
  const head = ellipse(0, H.headCenter, W.head, H.headHalf, Math.PI / 2, joinAngle, 12);
  head[0] = [0, H.headCenter + H.headHalf]; // exactly on the midline (cos π/2 is not 0 in floats)
  const torso: Unit[] = [
    [W.neck, H.neckBase],
    [W.shoulder, H.shoulderTop],
    [W.shoulder, H.armpit],
    [W.chest, H.chest],
    [W.waist, H.waist],
    [W.hip, H.hip],
    [W.thigh, H.crotch],
  ];
  const lower: Unit[] = legs
    ? [
        [W.kneeOuter, H.knee],
        [W.ankleOuter, H.ankle],
        [W.footOuter, 0],
        [W.footInner, 0],
        [W.kneeInner, H.knee],
        [0, H.crotch],
      ]
    : [[0, H.crotch]];
  return [...head, ...torso, ...lower];
}

/** Both halves: the right half, then the left half mirrored and reversed. */
function mirrored(right: Unit[]): Unit[] {
  const left = right.filter(([x]) => x !== 0).map(([x, y]): Unit => [-x, y]).reverse();
  return [...right, ...left];
}

/** Zones in unit coordinates (right side at +x). */
function unitZones(legs: boolean): { name: BodyZoneName; ring: Unit[] }[] {
  // Shoulder zones run from the neck along the shoulder slope to the shoulder tip.
  const slopeAt = (x: number) =>
    H.neckBase + ((x - W.neck) / (W.shoulder - W.neck)) * (H.shoulderTop - H.neckBase);
  const rightShoulder: Unit[] = [
    [0.2, slopeAt(0.2)],
    [W.shoulder, H.shoulderTop],
    [W.shoulder, H.armpit],
    [0.25, H.armpit],
  ];
  const rightThigh: Unit[] = [
    [0.04, H.thighTop],
    [0.38, H.thighTop],
    [0.31, H.thighLower],
    [0.06, H.thighLower],
  ];
  const flip = (ring: Unit[]): Unit[] => ring.map(([x, y]): Unit => [-x, y]).reverse();
  const zones: { name: BodyZoneName; ring: Unit[] }[] = [
    { name: 'face', ring: ellipse(0, 0.925, 0.15, 0.05, 0, 2 * Math.PI, 25).slice(0, 24) },
    { name: 'neck', ring: [[-0.12, 0.885], [-0.12, H.neckBase], [0.12, H.neckBase], [0.12, 0.885]] },
    { name: 'left-shoulder', ring: flip(rightShoulder) },
    { name: 'right-shoulder', ring: rightShoulder },
    {
      name: 'chest',
      ring: [[-0.25, 0.78], [-0.4, H.chest], [-0.37, H.chestLower], [0.37, H.chestLower], [0.4, H.chest], [0.25, 0.78]],
    },
    {
      name: 'abdomen',
      ring: [[-0.37, H.chestLower], [-0.35, H.waist], [-0.4, H.abdomenLower], [0.4, H.abdomenLower], [0.35, H.waist], [0.37, H.chestLower]],
    },
  ];
  if (legs) {
    zones.push({ name: 'left-thigh', ring: flip(rightThigh) }, { name: 'right-thigh', ring: rightThigh });
  }
  return zones;
}

/** The outline and zones scaled to a body of the given size and placed in the panel frame. */
export function bodyOverlay(options: BodyOverlayOptions = {}): BodyOverlay {
  const shoulderWidthCm = options.shoulderWidthCm ?? 42;
  const heightCm = options.heightCm ?? 172;
  if (!(shoulderWidthCm > 0 && heightCm > 0)) throw new RangeError('body size must be positive');
  const legs = options.legs ?? true;
  const { xCm: ox, yCm: oy } = options.offsetCm ?? { xCm: 0, yCm: 0 };
  const place = ([u, v]: Unit): [number, number] => [ox + u * shoulderWidthCm, oy + (v - TORSO_CENTER) * heightCm];
  return {
    shoulderWidthCm,
    heightCm,
    outline: mirrored(rightHalf(legs)).map(place),
    zones: unitZones(legs).map(({ name, ring }) => ({ name, polygon: ring.map(place) })),
  };
}
