/** Plane analysis: one distance's readings → peak, spread widths, uniformity, coverage map, isolines, body shares. */
export { analyzePlane, STANDARD_LEVELS_PCT, type PlaneAnalysis, type PlaneAnalysisOptions } from './analyze-plane.ts';
export { mergeRepeatedPoints, peakValue, POSITION_TOLERANCE_CM, type PlanePoint } from './plane-points.ts';
export { selectSpreadRow, spreadWidthAlongRow, type SpreadRow, type SpreadWidth } from './spread-width.ts';
export { footprintUniformity, uniformityStats, type FootprintCm, type UniformityStats } from './uniformity.ts';
export { planeField, type PlaneField } from './interpolate.ts';
export { coverageMap, type CoverageMap, type CoverageMapOptions } from './coverage-map.ts';
export { isolines, levelsFromPercent, type Isoline, type IsolineLevel } from './isolines.ts';
export { polygonsAreaCm2, ringContains, signedAreaCm2, type RingCm } from './polygon.ts';
export { bodyOverlay, type BodyOverlay, type BodyOverlayOptions, type BodyZone, type BodyZoneName } from './body-outline.ts';
export {
  bodyZoneCoverage,
  zoneCoverage,
  type BodyZoneCoverage,
  type FieldAtCm,
  type ZoneCoverage,
  type ZoneCoverageOptions,
} from './zone-coverage.ts';
export { planeCoverage, type PlaneCoverage, type PlaneCoverageOptions } from './plane-coverage.ts';
export { groupPlanesByDistance } from './group-planes.ts';
