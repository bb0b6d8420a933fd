import { assertFinite, assertVec3 } from "./validate";
import { DEG, type Point, type Vec3 } from "./vector";

export type Occluder =
  | { kind: "performer"; x: number; y: number; height: number; radius: number }
  | { kind: "panel"; a: Point; b: Point; height: number };

export type ShadowInput = { source: Vec3; apertureDiameter: number; backWallY: number; occluder: Occluder };

export type Shadow = {
  lands: "deck" | "wall" | "unbounded" | "none";
  reason?: string;
  /** Farthest point of the shadow: on the deck (z = 0) or on the back wall (z = wallHeight). */
  tip: Vec3 | null;
  /** Along the deck, from the occluder's far side to the tip (to the foot of the wall when it lands there). */
  length: number | null;
  wallHeight: number | null;
  /** At the tip, square to the rays (the design's D·b/a); on the surface divide by cos(incidenceDeg). */
  penumbraWidth: number | null;
  umbraWidth: number | null;
  /** Angle between the rays at the tip and the surface's normal. */
  incidenceDeg: number | null;
};

/** Penumbra width D·b/a of a source of diameter D, edge at distance a, surface b beyond it (similar triangles). */
export function penumbraWidth(d: number, a: number, b: number): number {
  return (d * b) / a;
}

/** Umbra width W·(a+b)/a − D·b/a of an object of width W; 0 where the umbra has closed. */
export function umbraWidth(w: number, d: number, a: number, b: number): number {
  return Math.max(0, (w * (a + b)) / a - (d * b) / a);
}

/**
 * The point of the occluder's top outline that casts the shadow's tip, its foot, and the occluder's width seen
 * from the lens. Which point that is depends on where the shadow lands:
 * - on the deck (lens above the top): the top point whose shadow lies farthest from the lens's foot in plan;
 * - on the back wall with the lens above the top: the most upstage top point (its ray falls least steeply);
 * - on the back wall with the lens at or below the top: the most downstage top point (its ray climbs most).
 */
export type Edge = { top: Vec3; foot: Point; width: number; insideReason: string | null };

type Outline = {
  /** Top point farthest from the lens's foot in plan (its shadow on the deck is the farthest too). */
  farthest: Point;
  mostUpstage: Point;
  mostDownstage: Point;
  width: number;
  insideReason: string | null;
};

function performerOutline(source: Vec3, o: Extract<Occluder, { kind: "performer" }>): Outline {
  assertFinite("Performer x", o.x);
  assertFinite("Performer y", o.y);
  assertFinite("Performer radius", o.radius);
  if (o.radius < 0) throw new RangeError(`Performer radius cannot be negative (got ${o.radius}).`);
  const wx = o.x - source.x;
  const wy = o.y - source.y;
  const r0 = Math.hypot(wx, wy);
  // Directly overhead the shadow pools all round; upstage is an arbitrary but stable choice of tip.
  const ux = r0 > 1e-9 ? wx / r0 : 0;
  const uy = r0 > 1e-9 ? wy / r0 : 1;
  const inside = r0 <= o.radius && source.z <= o.height;
  return {
    farthest: { x: o.x + o.radius * ux, y: o.y + o.radius * uy },
    mostUpstage: { x: o.x, y: o.y + o.radius },
    mostDownstage: { x: o.x, y: o.y - o.radius },
    width: 2 * o.radius,
    insideReason: inside ? "The lens is inside the performer's outline." : null,
  };
}

function panelOutline(source: Vec3, o: Extract<Occluder, { kind: "panel" }>): Outline {
  assertFinite("Panel point a.x", o.a.x);
  assertFinite("Panel point a.y", o.a.y);
  assertFinite("Panel point b.x", o.b.x);
  assertFinite("Panel point b.y", o.b.y);
  const lx = o.b.x - o.a.x;
  const ly = o.b.y - o.a.y;
  const len = Math.hypot(lx, ly);
  if (!(len > 1e-9)) throw new RangeError("A scenery panel needs two different end points.");
  const mx = (o.a.x + o.b.x) / 2 - source.x;
  const my = (o.a.y + o.b.y) / 2 - source.y;
  const r0 = Math.hypot(mx, my);
  // Width seen from the lens: the panel's extent square to the line of sight in plan.
  const width = r0 > 1e-9 ? Math.abs((lx * -my + ly * mx) / r0) : len;
  const onLine = Math.abs(lx * (source.y - o.a.y) - ly * (source.x - o.a.x)) / len < 1e-9;
  const t = ((source.x - o.a.x) * lx + (source.y - o.a.y) * ly) / (len * len);
  const inside = onLine && t >= 0 && t <= 1 && source.z <= o.height;
  // Shadows of the top edge scale from the lens's foot, so the farther end in plan casts the farther corner.
  const da = Math.hypot(o.a.x - source.x, o.a.y - source.y);
  const db = Math.hypot(o.b.x - source.x, o.b.y - source.y);
  const [down, up] = o.a.y <= o.b.y ? [o.a, o.b] : [o.b, o.a];
  return {
    farthest: db > da ? o.b : o.a,
    mostUpstage: up,
    mostDownstage: down,
    width,
    insideReason: inside ? "The lens is inside the scenery panel." : null,
  };
}

function outlineOf(source: Vec3, o: Occluder): Outline {
  assertFinite("Occluder height", o.height);
  if (o.height <= 0) throw new RangeError(`Occluder height must be above 0 m (got ${o.height}).`);
  return o.kind === "performer" ? performerOutline(source, o) : panelOutline(source, o);
}

function edgeAt(p: Point, o: Occluder, outline: Outline): Edge {
  return { top: { x: p.x, y: p.y, z: o.height }, foot: p, width: outline.width, insideReason: outline.insideReason };
}

/** The edge that casts the tip (see Edge). `backWallY` Infinity for no wall. */
export function occludingEdge(source: Vec3, o: Occluder, backWallY = Infinity): Edge {
  return edgeOfOutline(source, o, outlineOf(source, o), backWallY);
}

function edgeOfOutline(source: Vec3, o: Occluder, outline: Outline, backWallY: number): Edge {
  if (source.z <= o.height) return edgeAt(outline.mostDownstage, o, outline);
  const up = outline.mostUpstage;
  // The most upstage top point's ray is the one that reaches farthest up the wall; if even it meets the deck
  // first, no part of the shadow reaches the wall.
  const dy = up.y - source.y;
  if (dy > 0 && Number.isFinite(backWallY)) {
    const zAtWall = source.z + ((o.height - source.z) * (backWallY - source.y)) / dy;
    if (zAtWall >= 0) return edgeAt(up, o, outline);
  }
  return edgeAt(outline.farthest, o, outline);
}

/** A shadow with no measures, as one literal (an object spread here cost more than the geometry). */
function without(lands: "none" | "unbounded", reason: string): Shadow {
  return {
    lands,
    reason,
    tip: null,
    length: null,
    wallHeight: null,
    penumbraWidth: null,
    umbraWidth: null,
    incidenceDeg: null,
  };
}

/** Where the shadow of a performer or a panel lands for one lens, and its edge widths at the tip. */
export function shadowOf(i: ShadowInput): Shadow {
  const s = i.source;
  assertVec3("Lens position", s);
  assertFinite("Lens aperture", i.apertureDiameter);
  if (i.apertureDiameter < 0) throw new RangeError(`Lens aperture cannot be negative (got ${i.apertureDiameter}).`);
  if (Number.isNaN(i.backWallY)) throw new RangeError("Back-wall depth must be a number (Infinity for none).");
  if (s.y >= i.backWallY) throw new RangeError("The lens is behind the back wall.");
  // One outline serves every question below: the study asks this for every unit against every performer.
  const outline = outlineOf(s, i.occluder);
  const e = edgeOfOutline(s, i.occluder, outline, i.backWallY);
  if (outline.mostUpstage.y >= i.backWallY) {
    throw new RangeError("The occluder is at or behind the back wall.");
  }
  if (e.insideReason) return without("none", e.insideReason);
  if (s.z < e.top.z && e.top.y <= s.y + 1e-12 && outline.mostUpstage.y > s.y) {
    // Beside the occluder and below its top: rays over points just upstage of the lens climb the wall without
    // end, so there is no highest point to report.
    const reason = "The lens is beside the occluder and below its top, so the shadow runs to the horizon.";
    return without("unbounded", reason);
  }

  const dx = e.top.x - s.x;
  const dy = e.top.y - s.y;
  const dz = e.top.z - s.z;
  const a = Math.sqrt(dx * dx + dy * dy + dz * dz);
  // Ray S + t·(E − S); t = 1 at the edge. Deck at z = 0 when the ray descends, wall at y = backWallY.
  const tDeck = dz < 0 ? s.z / -dz : Infinity;
  const tWall = dy > 0 && Number.isFinite(i.backWallY) ? (i.backWallY - s.y) / dy : Infinity;
  if (tDeck === Infinity && tWall === Infinity) {
    const reason = "The lens is level with or below the top, so the shadow runs to the horizon.";
    return without("unbounded", reason);
  }
  const onWall = tWall < tDeck;
  // t − 1 from the edge's own offsets: with a distant source (the Sun) t is 1 + 1e-11 and t − 1 would be
  // noise, so the tip is stepped out from the edge rather than from the lens.
  const beyond = onWall ? (i.backWallY - e.top.y) / dy : e.top.z / -dz;
  const tip = onWall
    ? { x: e.top.x + beyond * dx, y: i.backWallY, z: e.top.z + beyond * dz }
    : { x: e.top.x + beyond * dx, y: e.top.y + beyond * dy, z: 0 };
  const b = beyond * a;
  const cosInc = onWall ? dy / a : -dz / a;
  return {
    lands: onWall ? "wall" : "deck",
    tip,
    length: Math.hypot(tip.x - e.foot.x, tip.y - e.foot.y),
    wallHeight: onWall ? tip.z : null,
    penumbraWidth: penumbraWidth(i.apertureDiameter, a, b),
    umbraWidth: umbraWidth(e.width, i.apertureDiameter, a, b),
    incidenceDeg: Math.acos(Math.min(1, cosInc)) / DEG,
  };
}
