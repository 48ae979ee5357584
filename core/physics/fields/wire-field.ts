import { MU0 } from '../constants';
import { FieldPointError, requireFinite } from './field-error';

/**
 * B in T at `distance` (m) from a long straight wire carrying `current` (A): mu0 I / (2 pi d).
 * The value is the azimuthal component in the right-hand sense about the current (thumb along the
 * current, fingers along B), so a negative current gives a negative value. Throws FieldPointError
 * 'on-conductor' at distance 0 and 'invalid-input' for a negative or non-finite distance.
 */
export function wireField(input: { current: number; distance: number }): number {
  const current = requireFinite('current', input.current, 'A');
  const distance = requireFinite('distance', input.distance, 'm');
  if (distance < 0) {
    throw new FieldPointError('invalid-input', `distance must not be negative (got ${distance} m).`);
  }
  if (distance === 0) {
    throw new FieldPointError('on-conductor', 'The point is on the wire itself (distance 0), where a thin-wire model has no finite field.');
  }
  return (MU0 * current) / (2 * Math.PI * distance);
}
