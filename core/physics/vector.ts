/** Three-component vectors as plain tuples, in SI units; x, y, z form a right-handed frame. */
export type Vec3 = [number, number, number];

/** a + b. */
export function add(a: Readonly<Vec3>, b: Readonly<Vec3>): Vec3 {
  return [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
}

/** a − b. */
export function sub(a: Readonly<Vec3>, b: Readonly<Vec3>): Vec3 {
  return [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
}

/** s·a for a scalar s. */
export function scale(a: Readonly<Vec3>, s: number): Vec3 {
  return [a[0] * s, a[1] * s, a[2] * s];
}

/** The scalar product a · b. */
export function dot(a: Readonly<Vec3>, b: Readonly<Vec3>): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}

/** The vector product a × b (right-handed: x × y = z). */
export function cross(a: Readonly<Vec3>, b: Readonly<Vec3>): Vec3 {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

/** The Euclidean length |a| (Math.hypot, so no overflow for large components). */
export function norm(a: Readonly<Vec3>): number {
  return Math.hypot(a[0], a[1], a[2]);
}

/** Whether all three components are finite numbers. */
export function isFiniteVec3(a: unknown): a is Vec3 {
  return Array.isArray(a) && a.length === 3 && a.every((c: unknown) => typeof c === 'number' && Number.isFinite(c));
}
