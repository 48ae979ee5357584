import { MU0 } from '../constants';
import { requireFinite, requireNonNegative, requirePositive } from './field-error';

/**
 * B_z in T on the axis of a finite solenoid of `turns` turns, `length` and `radius` (m), centred
 * at the origin along z: (mu0 n I / 2)(cos θ2 − cos θ1) with n = N/L, i.e.
 *   (mu0 n I / 2) [(z + L/2)/sqrt((z + L/2)^2 + R^2) − (z − L/2)/sqrt((z − L/2)^2 + R^2)],
 * valid inside and outside. A positive current circulates anticlockwise seen from +z (B along +z).
 * It tends to mu0 n I at the centre of a long solenoid and to half that at its ends.
 */
export function solenoidFieldOnAxis(input: { turns: number; length: number; radius: number; current: number; z: number }): number {
  const turns = requireNonNegative('turns', input.turns, 'turns');
  const length = requirePositive('length', input.length, 'm');
  const radius = requirePositive('radius', input.radius, 'm');
  const current = requireFinite('current', input.current, 'A');
  const z = requireFinite('z', input.z, 'm');
  const far = z + length / 2;
  const near = z - length / 2;
  const cosines = far / Math.hypot(far, radius) - near / Math.hypot(near, radius);
  return ((MU0 * (turns / length) * current) / 2) * cosines;
}
