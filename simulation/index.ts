/** Public API of the light-and-heat engine (pure TypeScript; see simulation/README.md). */
export * from './model';
export { EXAMPLE_DESIGN, exampleDesign } from './model/example';
export * from './fields/types';
export { computeFields, probe, recycleFields } from './fields/grid';
export { FieldSolver, type SolverStats } from './fields/solver';
export { HEAT_DEFAULTS, AIR_MODEL, surfaceTempC, airTempC } from './fields/heat';
export { meshOpenArea } from './model/materials';
export {
  erythemaWeight,
  uviFromErythemal,
  uviPerUvbFromSpectrum,
  UVI_PER_ERYTHEMAL_W_M2,
  SUNLIGHT_UVI_PER_UVB,
  SHORT_WAVE_RATIO_FACTOR,
  isShortWaveRatio,
} from './sources/uv';
export { surfaceC } from './assess/format';
export { METER_CAVEAT, RULE_OF_THUMB_LABEL, shortWaveCaution } from './assess/uvTargets';
export { tubeBelowCentre, tubePiece, tubePieceOffset } from './sources/tube';
export { pointIrradiance } from './sources/point';
export {
  allZoneDistances,
  zoneDistances,
  ZONE_SETUP_ASSUMPTIONS,
  NEAREST_CM as ZONE_NEAREST_CM,
  FARTHEST_CM as ZONE_FARTHEST_CM,
  type ZoneDistance,
  type ZoneDistances,
  type ZoneLamp,
  type ZoneSetup,
} from './zoneDistances';
export { contourBands, defaultThresholds, UVI_THRESHOLDS, type ContourBand } from './contours';
export {
  UV_ZONES,
  UV_REFUGE_UVI,
  zonesForMaxUvi,
  zonesForMeanUvi,
  type UvZone,
  type ZoneRange,
} from './assess/zones';
export type { Assessment, Finding, FindingStatus, FindingWhere, Segment } from './assess/types';
export { assess, monthsUntilUnmet } from './assess/assess';
export { baskingUviRange, isShadeZone, targetZone, LOW_MELANIN_CAUTION } from './assess/basking-range';
export { centreX as segmentsCentreX, neededBaskingCm } from './assess/sharedBasking';
export { reachableSurfaces, type SurfaceSample } from './assess/surfaces';
export { climberMeshRisks, type MeshRisk } from './assess/safetyFindings';
export * as ASSESSMENT_THRESHOLDS from './assess/thresholds';
export { speciesSheetSchema } from './model/species';
export { handleRequest, takeHandedBack } from './worker/handle';
export { LatestRequestQueue } from './worker/queue';
export { transferables, type SimRequest, type SimResponse, type SimResult } from './worker/protocol';
