import { FieldPointError, requireFinite, requireNonNegative } from './field-error';

const DEG = Math.PI / 180;

/**
 * The bearing of a compass needle's north pole, in degrees from the magnetic meridian (positive
 * towards east, in (−180, 180]), when a coil's horizontal field `coilField` (T) acts at `angle`
 * degrees from magnetic north (measured towards east; 90 by default: the tangent galvanometer)
 * on top of the Earth's horizontal field `earthHorizontalField` (T, along north). The needle lines
 * up with the vector sum: tan θ = B_c sin φ / (B_H + B_c cos φ); for φ = 90°, tan θ = B_c / B_H
 * (the tangent law). A negative coilField means the field points the other way (φ + 180°).
 */
export function needleDeflection(input: { coilField: number; earthHorizontalField: number; angle?: number }): number {
  const coil = requireFinite('coilField', input.coilField, 'T');
  const earth = requireNonNegative('earthHorizontalField', input.earthHorizontalField, 'T');
  const angle = requireFinite('angle', input.angle ?? 90, 'degrees');
  const east = coil * Math.sin(angle * DEG);
  const north = earth + coil * Math.cos(angle * DEG);
  if (Math.hypot(east, north) <= 1e-15 * Math.max(Math.abs(coil), earth, Number.MIN_VALUE)) {
    throw new FieldPointError('invalid-input', 'The coil field cancels the Earth field exactly, so the needle has no preferred direction.');
  }
  const bearing = Math.atan2(east, north) / DEG;
  return bearing === -180 ? 180 : bearing;
}
