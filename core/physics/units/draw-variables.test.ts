import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cyrb53, drawVariables, mulberry32 } from './draw-variables.ts';
import { PhysicsError } from './errors.ts';
import { parseQuantity } from './parse-quantity.ts';
import type { VariableSpec } from './types.ts';

const coil: VariableSpec[] = [
  { name: 'N', min: 20, max: 60, step: 1, role: 'turns' },
  { name: 'I', min: 0.5, max: 2.5, step: 0.1, unit: 'A' },
  { name: 'a', min: 3, max: 9, step: 0.5, unit: 'cm', role: 'radius' },
];

function numberOf(value: number | string): number {
  return typeof value === 'number' ? value : Number(value.split(' ')[0]);
}

describe('drawVariables', () => {
  it('formats values as the student sees them', () => {
    const values = drawVariables(coil, 'student-1');
    expect(typeof values.N).toBe('number');
    expect(values.I).toMatch(/^\d+(\.\d)? A$/);
    expect(values.a).toMatch(/^\d(\.5)? cm$/);
    const a = parseQuantity(String(values.a));
    expect(a.ok && a.dimension).toBe('length');
  });

  it('is deterministic per seed and differs between seeds', () => {
    expect(drawVariables(coil, 'student-1')).toEqual(drawVariables(coil, 'student-1'));
    expect(drawVariables(coil, 42)).toEqual(drawVariables(coil, 42));
    const draws = new Set(Array.from({ length: 50 }, (_, i) => JSON.stringify(drawVariables(coil, `s${i}`))));
    expect(draws.size).toBeGreaterThan(40);
  });

  it('keeps a variable stable when another is added', () => {
    const before = drawVariables(coil.slice(0, 2), 'x');
    const after = drawVariables(coil, 'x');
    expect(after.N).toBe(before.N);
    expect(after.I).toBe(before.I);
  });

  it('has a hash that separates seeds and a generator in [0, 1) with a mean near 1/2', () => {
    // Common practice sanity checks (no published vectors used here).
    expect(cyrb53('a')).toBe(cyrb53('a'));
    expect(Number.isSafeInteger(cyrb53('a'))).toBe(true);
    expect(cyrb53('a')).not.toBe(cyrb53('b'));
    const r = mulberry32(1);
    const xs = Array.from({ length: 1000 }, () => r());
    expect(Math.min(...xs)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...xs)).toBeLessThan(1);
    const mean = xs.reduce((s, x) => s + x, 0) / xs.length;
    expect(Math.abs(mean - 0.5)).toBeLessThan(0.05);
  });

  it('property: values stay in range on the step grid, with no floating noise', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: -1000, max: 1000 }),
        fc.integer({ min: 0, max: 500 }),
        fc.constantFrom(1, 0.5, 0.1, 0.25, 0.01, 2, 5),
        fc.string(),
        (minTimes100, spanSteps, step, seed) => {
          const min = minTimes100 / 100;
          const max = Number((min + spanSteps * step).toFixed(4));
          const spec: VariableSpec = { name: 'x', min, max, step, unit: 'cm' };
          const value = drawVariables([spec], seed).x as string;
          expect(drawVariables([spec], seed).x).toBe(value);
          const x = numberOf(value);
          expect(x).toBeGreaterThanOrEqual(min - 1e-9);
          expect(x).toBeLessThanOrEqual(max + 1e-9);
          const k = (x - min) / step;
          expect(Math.abs(k - Math.round(k))).toBeLessThan(1e-6);
          // No noise such as 4.499999999: at most the decimals of step and min.
          expect(value.split(' ')[0]?.split('.')[1]?.length ?? 0).toBeLessThanOrEqual(4);
        },
      ),
    );
  });

  it.each([
    [{ name: 'x', min: 2, max: 1, step: 1 }, 'invalid-range'],
    [{ name: 'x', min: 0, max: Number.NaN, step: 1 }, 'invalid-range'],
    [{ name: 'x', min: 0, max: 1, step: 0 }, 'invalid-step'],
    [{ name: 'x', min: 0, max: 1, step: -0.1 }, 'invalid-step'],
    [{ name: 'x', min: 0, max: 1, step: 0.1, unit: 'furlongz' }, 'unknown-unit'],
    [{ name: '2x', min: 0, max: 1, step: 0.1 }, 'invalid-name'],
  ] as const)('rejects %j with %s', (spec, code) => {
    expect(() => drawVariables([spec], 1)).toThrow(PhysicsError);
    try {
      drawVariables([spec], 1);
    } catch (error) {
      expect((error as PhysicsError).code).toBe(code);
      expect((error as PhysicsError).message).toContain('Variable "');
    }
  });

  it('rejects a name declared twice', () => {
    expect(() => drawVariables([coil[0] as VariableSpec, coil[0] as VariableSpec], 1)).toThrow(/declared twice/);
  });
});
