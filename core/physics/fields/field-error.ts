import { isFiniteVec3, type Vec3 } from '../vector';

/** Why a field model refused its input. */
export type FieldErrorCode = 'on-conductor' | 'invalid-input';

/**
 * Thrown by the field models instead of returning Infinity or NaN: 'on-conductor' for a point on
 * the wire (or at a dipole), where a thin-conductor model has no finite field; 'invalid-input'
 * for a non-finite number or a negative/zero size. The message is plain enough to show a teacher.
 */
export class FieldPointError extends Error {
  readonly code: FieldErrorCode;

  constructor(code: FieldErrorCode, message: string) {
    super(message);
    this.name = 'FieldPointError';
    this.code = code;
  }
}

/** A finite number, or an 'invalid-input' error naming the input and its unit. */
export function requireFinite(name: string, value: number, unit: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new FieldPointError('invalid-input', `${name} must be a finite number in ${unit} (got ${String(value)}).`);
  }
  return value;
}

/** A finite number above zero (a radius, a length, a distance). */
export function requirePositive(name: string, value: number, unit: string): number {
  requireFinite(name, value, unit);
  if (value <= 0) {
    throw new FieldPointError('invalid-input', `${name} must be greater than zero, in ${unit} (got ${value}).`);
  }
  return value;
}

/** A finite number of zero or more (a number of turns). */
export function requireNonNegative(name: string, value: number, unit: string): number {
  requireFinite(name, value, unit);
  if (value < 0) {
    throw new FieldPointError('invalid-input', `${name} must not be negative (got ${value} ${unit}).`);
  }
  return value;
}

/** A point or vector [x, y, z] of finite numbers. */
export function requireVec3(name: string, value: Readonly<Vec3>, unit: string): Readonly<Vec3> {
  if (!isFiniteVec3(value)) {
    throw new FieldPointError('invalid-input', `${name} must be three finite numbers [x, y, z] in ${unit}.`);
  }
  return value;
}
