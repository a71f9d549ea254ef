/**
 * Body sizes the planner offers for the body outline: round figures of our own for a drawing
 * aid (shoulder width across the outline, standing height), not anthropometric data. Medium is
 * the outline's own default.
 */
import type { BodySizeCm } from './types.ts';

export type BodySizePreset = 'small' | 'medium' | 'large';

export const BODY_SIZE_PRESETS: Readonly<Record<BodySizePreset, BodySizeCm>> = {
  small: { shoulderWidthCm: 38, heightCm: 160 },
  medium: { shoulderWidthCm: 42, heightCm: 172 },
  large: { shoulderWidthCm: 48, heightCm: 188 },
};

