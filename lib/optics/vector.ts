/** A point or direction in stage space: metres, x toward stage left, y upstage, z up from the deck. */
export type Vec3 = { x: number; y: number; z: number };
/** A point on the plan (the deck seen from above). */
export type Point = { x: number; y: number };

export const DEG = Math.PI / 180;

export function sub(a: Vec3, b: Vec3): Vec3 {
  return { x: a.x - b.x, y: a.y - b.y, z: a.z - b.z };
}

export function length(v: Vec3): number {
  return Math.sqrt(v.x * v.x + v.y * v.y + v.z * v.z);
}

export function distance(a: Vec3, b: Vec3): number {
  const dx = a.x - b.x;
  const dy = a.y - b.y;
  const dz = a.z - b.z;
  return Math.sqrt(dx * dx + dy * dy + dz * dz);
}

/** Twice the signed area of triangle o-a-b: > 0 when b lies to the left of o→a. */
export function cross2(o: Point, a: Point, b: Point): number {
  return (a.x - o.x) * (b.y - o.y) - (a.y - o.y) * (b.x - o.x);
}

/** Folds -0 into 0 so that printed and compared results never show a negative zero. */
export function noNegZero(n: number): number {
  return n === 0 ? 0 : n;
}
