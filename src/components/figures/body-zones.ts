import type { BodyZoneName } from '#shared/measurement/plane/body-outline.ts';

/** The body outline's zones as readers see them named (right = the +x side, as drawn). */
export const BODY_ZONE_LABELS: Readonly<Record<BodyZoneName, string>> = {
  face: 'Face',
  neck: 'Neck',
  'left-shoulder': 'Left shoulder',
  'right-shoulder': 'Right shoulder',
  chest: 'Chest',
  abdomen: 'Abdomen',
  'left-thigh': 'Left thigh',
  'right-thigh': 'Right thigh',
};
