import { MU0 } from '../constants';
import { FieldPointError, requireFinite } from './field-error';

/**
 * B in T on the axis of a point magnetic dipole of `moment` (A m^2, along +z) at distance z (m):
 * (mu0 / 4 pi) 2 m / |z|^3. On the axis the field points along the moment on both sides, so the
 * sign follows the moment, not z. The far-field limit of a loop (m = N I pi a^2). Throws
 * FieldPointError 'on-conductor' at z = 0, the dipole itself.
 */
export function dipoleFieldOnAxis(input: { moment: number; z: number }): number {
  const moment = requireFinite('moment', input.moment, 'A m^2');
  const z = requireFinite('z', input.z, 'm');
  if (z === 0) {
    throw new FieldPointError(
      'on-conductor',
      'The point is at the dipole itself (z = 0), where the point-dipole model has no finite field.',
    );
  }
  return ((MU0 / (4 * Math.PI)) * 2 * moment) / Math.abs(z) ** 3;
}
