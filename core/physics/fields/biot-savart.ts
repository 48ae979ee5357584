import { MU0 } from '../constants';
import { cross, dot, norm, sub, type Vec3 } from '../vector';
import { FieldPointError, requireFinite, requireVec3 } from './field-error';

/** A point closer than this fraction of a segment's length to the segment counts as on the wire. */
const ON_WIRE = 1e-12;

/**
 * B (T) at `point` (m) of a current `current` (A) flowing along the polyline `path` (m) from its
 * first point to its last (`closed`: back to the first as well). Each straight segment from A to
 * B contributes its exact field (the finite-wire result in the compact form of Hanson and
 * Hirshman, Phys. Plasmas 9, 4410, 2002):
 *   dB = (mu0 I / 4 pi) · 2 L (Ri + Rf) / (Ri Rf ((Ri + Rf)^2 − L^2)) · (û × Ri_vec),
 * with Ri_vec = point − A, Rf = |point − B|, L = |B − A|, û = (B − A)/L; a point on a segment's
 * line beyond its ends gets zero from it. Repeated points (zero-length segments) are skipped.
 * (Ri + Rf)^2 − L^2 is formed as e (Ri + Rf + L) with e = Ri + Rf − L summed from two
 * cancellation-free parts, so a long segment seen from close by keeps full precision.
 * Throws FieldPointError 'on-conductor' for a point on a segment.
 */
export function biotSavart(input: { path: readonly Readonly<Vec3>[]; current: number; point: Readonly<Vec3>; closed?: boolean }): Vec3 {
  const { path, closed = false } = input;
  const current = requireFinite('current', input.current, 'A');
  const point = requireVec3('point', input.point, 'm');
  if (!Array.isArray(path) || path.length < 2) {
    throw new FieldPointError('invalid-input', 'path must list at least two points [x, y, z] in m.');
  }
  path.forEach((p, i) => requireVec3(`path[${i}]`, p, 'm'));
  const total: Vec3 = [0, 0, 0];
  const segments = closed ? path.length : path.length - 1;
  for (let i = 0; i < segments; i += 1) {
    const start = path[i] as Readonly<Vec3>;
    const end = path[(i + 1) % path.length] as Readonly<Vec3>;
    const along = sub(end, start);
    const length = norm(along);
    if (length === 0) continue;
    const fromStart = sub(point, start);
    const ri = norm(fromStart);
    const rf = norm(sub(point, end));
    const sum = ri + rf;
    const direction = cross(along, fromStart);
    const alongFromStart = dot(fromStart, along) / length;
    const alongToEnd = length - alongFromStart;
    // Distance from the point to the nearest point of the segment decides 'on the wire'.
    const gap = alongFromStart <= 0 ? ri : alongToEnd <= 0 ? rf : norm(direction) / length;
    if (gap <= ON_WIRE * length) {
      throw new FieldPointError(
        'on-conductor',
        `The point (${point.join(', ')}) m lies on segment ${i + 1} of the wire, where a thin-wire model has no finite field.`,
      );
    }
    const excess = rimExcess(alongFromStart, ri, direction, length) + rimExcess(alongToEnd, rf, direction, length);
    const factor = (2 * length * sum) / (ri * rf * excess * (sum + length));
    // `along` is not normalised, so divide its length back out.
    const k = factor / length;
    total[0] += k * direction[0];
    total[1] += k * direction[1];
    total[2] += k * direction[2];
  }
  const c = (MU0 * current) / (4 * Math.PI);
  return [c * total[0], c * total[1], c * total[2]];
}

/**
 * R − u for a distance R = sqrt(u^2 + d^2) from an end of a segment, u the signed distance along
 * it: d^2 / (R + u) when u > 0 (where R − u would cancel), else R + |u|. d^2 = |along × r|^2 / L^2.
 */
function rimExcess(u: number, r: number, alongCrossR: Readonly<Vec3>, length: number): number {
  if (u <= 0) return r - u;
  const d = norm(alongCrossR) / length;
  return (d * d) / (r + u);
}
