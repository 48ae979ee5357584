import { add, cross, dot, norm, scale, sub, type Vec3 } from '../vector';
import { FieldPointError, requireVec3 } from './field-error';

/**
 * The sense of a closed path (last point joined to the first) seen from the tip of `axis`
 * (default +z, i.e. looking down at the xy-plane): 'anticlockwise' when its vector area
 * ½ Σ p_i × p_(i+1) points along the axis, 'clockwise' when against it. By the right-hand rule
 * an anticlockwise current gives B along +axis inside the loop. Throws FieldPointError
 * 'invalid-input' for fewer than three points, a zero axis, or a path that encloses no area
 * seen from that axis (edge-on or degenerate).
 */
export function circulation(path: readonly Readonly<Vec3>[], axis: Readonly<Vec3> = [0, 0, 1]): 'clockwise' | 'anticlockwise' {
  const n = requireVec3('axis', axis, 'any unit');
  const axisLength = norm(n);
  if (axisLength === 0) throw new FieldPointError('invalid-input', 'axis must not be the zero vector.');
  if (!Array.isArray(path) || path.length < 3) {
    throw new FieldPointError('invalid-input', 'A closed path needs at least three points [x, y, z].');
  }
  path.forEach((p, i) => requireVec3(`path[${i}]`, p, 'm'));
  // Work about the centroid: the vector area does not depend on the origin, and this keeps it accurate.
  const centroid = scale(
    path.reduce<Vec3>((s, p) => add(s, p), [0, 0, 0]),
    1 / path.length,
  );
  let area: Vec3 = [0, 0, 0];
  let size = 0;
  path.forEach((p, i) => {
    const a = sub(p, centroid);
    const b = sub(path[(i + 1) % path.length] as Readonly<Vec3>, centroid);
    area = add(area, cross(a, b));
    size = Math.max(size, norm(a));
  });
  const projected = dot(area, n) / axisLength / 2;
  if (Math.abs(projected) <= 1e-12 * size * size) {
    throw new FieldPointError(
      'invalid-input',
      'The path encloses no area seen from this axis (it is edge-on or folds back on itself), so it has no sense of circulation.',
    );
  }
  return projected > 0 ? 'anticlockwise' : 'clockwise';
}
