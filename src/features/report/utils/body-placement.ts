/**
 * Where the body sits in front of the unit. The reader picks a body size and the height on the
 * body that faces the centre of the unit's emitting area (the map's origin); the overlay is then
 * placed so that point of the body's midline lies on the origin.
 */
import { bodyOverlay, type BodyOverlay, type BodyZoneName } from '#shared/measurement/plane/body-outline.ts';
import { ringBoundsCm } from '#shared/measurement/plane/polygon.ts';
import type { BodySizeCm } from '#shared/measurement/planner/types.ts';

export { BODY_SIZE_PRESETS, type BodySizePreset } from '#shared/measurement/planner/body-sizes.ts';
export type BodySize = BodySizeCm;

/** Limits for typed body sizes, cm (the session planner's): wide enough for adults, narrow enough to catch a slip. */
export const BODY_LIMITS_CM = { shoulderWidth: { min: 20, max: 80 }, height: { min: 100, max: 230 } } as const;

export type PlacementAnchor = 'face' | 'chest' | 'torso' | 'abdomen' | 'thighs';

export const PLACEMENT_LABELS: Readonly<Record<PlacementAnchor, string>> = {
  face: 'Face',
  chest: 'Chest',
  torso: 'Middle of the torso',
  abdomen: 'Abdomen',
  thighs: 'Thighs',
};

const ANCHOR_ZONE: Readonly<Record<Exclude<PlacementAnchor, 'torso'>, BodyZoneName>> = {
  face: 'face',
  chest: 'chest',
  abdomen: 'abdomen',
  thighs: 'right-thigh',
};

/** Height above the soles of the torso centre (the outline's own anchor), cm. */
function torsoCenterAboveSolesCm(reference: BodyOverlay): number {
  return -ringBoundsCm(reference.outline).minY;
}

/**
 * Height above the soles, cm, of a point of the body: the torso centre (halfway between the
 * shoulder line and the hips) or the middle of a zone's height. The thighs use one thigh: both
 * lie at the same height.
 */
export function anchorHeightCm(body: BodySize, anchor: PlacementAnchor): number {
  const reference = bodyOverlay({ ...body, legs: true });
  const soles = ringBoundsCm(reference.outline).minY;
  if (anchor === 'torso') return torsoCenterAboveSolesCm(reference);
  const zone = reference.zones.find((z) => z.name === ANCHOR_ZONE[anchor]);
  if (!zone) return torsoCenterAboveSolesCm(reference);
  const b = ringBoundsCm(zone.polygon);
  return (b.minY + b.maxY) / 2 - soles;
}

/** The outline placed so the point `unitCenterHeightCm` above the soles faces the unit's centre. */
export function placedOverlay(body: BodySize, unitCenterHeightCm: number): BodyOverlay {
  const torso = torsoCenterAboveSolesCm(bodyOverlay({ ...body, legs: true }));
  return bodyOverlay({ ...body, legs: true, offsetCm: { xCm: 0, yCm: torso - unitCenterHeightCm } });
}
