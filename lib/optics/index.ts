/** The beam model (docs/optics.md): pure functions, SI lengths, degrees at this boundary, radians inside. */
export type { Point, Vec3 } from "./vector";
export { beamAim, type Aim } from "./aim";
export { poolAtPlane, ellipseBounds, type Ellipse, type PlanePool, type PoolInput } from "./pool";
export {
  FIXTURE_FAMILIES,
  fromDatasheet,
  profileShapeOf,
  relativeIntensity,
  type Family,
  type ProfileShape,
} from "./profile";
export { irisedConeDeg, peakCandelaAt, zoomedBeam, type ZoomPeakType } from "./zoom-peak";
export { illuminanceAt, type LitBeam } from "./illuminance";
export {
  gridPoint,
  illuminanceGrid,
  zoneStats,
  type Bounds,
  type Grid,
  type GridCells,
  type GridInput,
  type ZoneStats,
} from "./illuminance-grid";
export { clipPoolByCuts, ellipseToPolygon, MAX_CUTS, type CutLine } from "./cuts";
export { convexHull, pointInPolygon, polygonArea } from "./polygon";
export { penumbraWidth, shadowOf, umbraWidth, type Occluder, type Shadow, type ShadowInput } from "./shadow";
export { shadowPolygons, shadowPolygonsOf, type OutlineOptions, type ShadowPolygons } from "./shadow-polygons";
export {
  footcandlesToLux,
  formatIlluminance,
  formatLength,
  LUX_PER_FOOTCANDLE,
  luxToFootcandles,
  METRES_PER_FOOT,
  METRES_PER_INCH,
  parseAngle,
  parseLength,
  type Units,
} from "./units";
export { describeBeam, describePoint, edgeWord, SIDE_DEG, STRAIGHT_DEG, type EdgeWord } from "./beam-words";
// Coverage and shadow studies.
export { FACING_AUDIENCE_DEG, faceLightAt, facingNormal, verticalIlluminanceAt, type FaceLight } from "./vertical";
export { coverageGrid, planeHeight, type CoverageGrid, type CoverageInput, type Measure } from "./coverage-grid";
export {
  areaCoverage,
  DEFAULT_THRESHOLDS,
  type AreaCoverage,
  type AreaFlag,
  type AreaInput,
  type AreaThresholds,
} from "./area-coverage";
export { differenceGrid, gridValueAt, lineProfile, type LineSample } from "./grid-compare";
export { transmissionOf, type ColourList, type Transmission } from "./transmission";
export {
  DIMMER_CURVE_WORDS,
  dimmerCurveOf,
  lightFromLevel,
  tungstenColourTemperature,
  TUNGSTEN_EXPONENT,
  type DimmerCurve,
} from "./dimmer-curve";
