import { describe, expect, it } from 'vitest';
import { dipoleFieldOnAxis } from './dipole-field';
import { FieldPointError } from './field-error';
import { helmholtzFieldOnAxis, loopField, loopFieldOnAxis } from './loop-field';
import { needleDeflection } from './needle-deflection';
import { solenoidFieldOnAxis } from './solenoid-field';
import { wireField } from './wire-field';

/** The error a call throws, so its class, code and message can all be checked. */
function thrown(call: () => unknown): FieldPointError {
  try {
    call();
  } catch (error) {
    if (error instanceof FieldPointError) return error;
    throw error;
  }
  throw new Error('expected a FieldPointError, but the call returned');
}

const loop = { turns: 10, current: 2, radius: 0.05 };

describe('FieldPointError: a typed error instead of Infinity or NaN', () => {
  it('is thrown on the loop wire, wherever the point is on it', () => {
    for (const point of [
      [0.05, 0, 0],
      [0, -0.05, 0],
      [0.05 * Math.SQRT1_2, 0.05 * Math.SQRT1_2, 0],
    ] as [number, number, number][]) {
      const error = thrown(() => loopField({ ...loop, point }));
      expect(error.code).toBe('on-conductor');
      expect(error.name).toBe('FieldPointError');
      expect(error.message).toMatch(/on the loop's wire/);
    }
    // Just off the wire the field is large but finite.
    const near = loopField({ ...loop, point: [0.05 + 1e-9, 0, 0] });
    expect(near.every(Number.isFinite)).toBe(true);
  });

  it('is thrown at distance 0 from a wire and at the dipole itself', () => {
    expect(thrown(() => wireField({ current: 1, distance: 0 })).code).toBe('on-conductor');
    expect(thrown(() => dipoleFieldOnAxis({ moment: 1, z: 0 })).code).toBe('on-conductor');
    expect(thrown(() => wireField({ current: 1, distance: -0.01 })).message).toBe('distance must not be negative (got -0.01 m).');
  });

  it('is thrown for non-finite and negative sizes, naming the input', () => {
    const cases: [() => unknown, RegExp][] = [
      [() => loopFieldOnAxis({ ...loop, radius: -0.05, z: 0 }), /^radius must be greater than zero/],
      [() => loopFieldOnAxis({ ...loop, radius: 0, z: 0 }), /^radius/],
      [() => loopFieldOnAxis({ ...loop, radius: Number.NaN, z: 0 }), /^radius must be a finite number in m/],
      [() => loopFieldOnAxis({ ...loop, z: Infinity }), /^z must be a finite number/],
      [() => loopFieldOnAxis({ ...loop, turns: -3, z: 0 }), /^turns must not be negative/],
      [() => loopField({ ...loop, point: [0, 0, Number.NaN] }), /^point must be three finite numbers/],
      [() => helmholtzFieldOnAxis({ ...loop, current: Number.NaN, z: 0 }), /^current/],
      [() => solenoidFieldOnAxis({ turns: 100, length: -0.1, radius: 0.01, current: 1, z: 0 }), /^length/],
      [() => solenoidFieldOnAxis({ turns: 100, length: 0.1, radius: Infinity, current: 1, z: 0 }), /^radius/],
      [() => wireField({ current: 1, distance: Number.POSITIVE_INFINITY }), /^distance/],
      [() => dipoleFieldOnAxis({ moment: Number.NaN, z: 1 }), /^moment/],
      [() => needleDeflection({ coilField: 1e-5, earthHorizontalField: -1e-5 }), /^earthHorizontalField/],
      [() => needleDeflection({ coilField: 1e-5, earthHorizontalField: 1e-5, angle: Number.NaN }), /^angle/],
    ];
    for (const [call, message] of cases) {
      const error = thrown(call);
      expect(error.code).toBe('invalid-input');
      expect(error.message).toMatch(message);
    }
  });

  it('never lets Infinity or NaN out for in-range inputs', () => {
    expect(Number.isFinite(solenoidFieldOnAxis({ turns: 100, length: 0.1, radius: 0.01, current: 1, z: 0.05 }))).toBe(true);
    expect(Number.isFinite(dipoleFieldOnAxis({ moment: 1, z: -1e-3 }))).toBe(true);
    expect(loopField({ ...loop, point: [1e3, 0, 1e3] }).every(Number.isFinite)).toBe(true);
  });
});
