/** The beam model (docs/optics.md): pure functions, SI lengths, degrees at this boundary, radians inside. */
export type { Point, Vec3 } from "./vector";
export { beamAim, type Aim } from "./aim";
export { poolAtPlane, ellipseBounds, type Ellipse, type PlanePool, type PoolInput } from "./pool";
export {
  FIXTURE_FAMILIES, fromDatasheet, profileShapeOf, relativeIntensity, type Family, type ProfileShape,
} from "./profile";
export { illuminanceAt, type LitBeam } from "./illuminance";
export {
  gridPoint, illuminanceGrid, zoneStats, type Bounds, type Grid, type GridCells, type GridInput, type ZoneStats,
} from "./grid";
export { clipPoolByCuts, ellipseToPolygon, MAX_CUTS, type CutLine } from "./cuts";
export { convexHull, pointInPolygon, polygonArea } from "./polygon";
export { penumbraWidth, shadowOf, umbraWidth, type Occluder, type Shadow, type ShadowInput } from "./shadow";
export { shadowPolygons, type ShadowPolygons } from "./shadow-polygons";
export {
  footcandlesToLux, formatIlluminance, formatLength, LUX_PER_FOOTCANDLE, luxToFootcandles, METRES_PER_FOOT,
  METRES_PER_INCH, parseAngle, parseLength, type Units,
} from "./units";
export { describeBeam, describePoint, edgeWord, SIDE_DEG, STRAIGHT_DEG, type EdgeWord } from "./words";
