import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compileFormula, evaluateFormula } from './evaluate-formula.ts';

const MU0 = 1.25663706212e-6; // NIST, CODATA 2018 recommended values

describe('evaluateFormula', () => {
  it('computes the field at the centre of a coil, B = mu0 N I / (2a)', () => {
    // Independent method: the same formula by hand in SI, N = 30, I = 2 A, a = 0.05 m → about 7.54e-4 T.
    const expected = (MU0 * 30 * 2) / (2 * 0.05);
    const result = evaluateFormula('mu0*N*I/(2*a)', { N: 30, I: '2 A', a: '5 cm' });
    expect(result).toMatchObject({ ok: true, unit: 'T', dimension: 'magnetic-field' });
    if (result.ok) {
      expect(Math.abs(result.value - expected) / expected).toBeLessThan(1e-12);
      expect(result.value).toBeCloseTo(7.54e-4, 6);
    }
  });

  it('matches the long-wire example: B = mu0 I / (2 pi R), I = 2 A, R = 0.01 m → 4e-5 T', () => {
    // OpenStax University Physics Vol. 2, 12.2, Example "Calculating Magnetic Field Due to Three Wires" (TA: 1 figure).
    const result = evaluateFormula('µ0·I/(2π·R)', { I: '2 A', R: '1 cm' });
    expect(result.ok && Number(result.value.toPrecision(1))).toBe(4e-5);
  });

  it('reads the usual functions, powers and implicit multiplication', () => {
    expect(evaluateFormula('sqrt(a^2 + b^2)', { a: '3 m', b: '4 m' })).toMatchObject({ ok: true, value: 5, unit: 'm' });
    expect(evaluateFormula('2a', { a: '5 cm' })).toMatchObject({ ok: true, value: 0.1, dimension: 'length' });
    const angle = evaluateFormula('atan(Bc/Bh)', { Bc: '40 µT', Bh: '40 µT' });
    expect(angle.ok && angle.value).toBeCloseTo(Math.PI / 4, 14);
    expect(angle).toMatchObject({ unit: 'rad', dimension: 'angle' });
    const sine = evaluateFormula('sin(t)', { t: '30 deg' });
    expect(sine.ok && sine.value).toBeCloseTo(0.5, 14);
    expect(evaluateFormula('pi*r²', { r: '2 m' })).toMatchObject({ ok: true, dimension: 'area' });
    expect(evaluateFormula('log10(x) + log(e) + abs(-2) + pow(2, 3)', { x: 1000 })).toMatchObject({ ok: true, value: 14 });
  });

  it.each([
    'import("x")',
    'import({}, {override: true})',
    'evaluate("1")',
    'createUnit("x")',
    'parse("1")',
    'simplify("x")',
    'a = 1',
    'f(x) = x',
    '[1,2]',
    'x.y',
    'x["constructor"]',
    '{a: 1}',
    '1:3',
    'x ? 1 : 2',
    'x; 1',
    '"text"',
    'true',
    '5!',
    'x == 1',
    'x to cm',
    'x mod 2',
    'cube(2)',
  ])('refuses %s with formula-not-allowed', (expression) => {
    const result = evaluateFormula(expression, { x: 1, a: 1 });
    expect(result).toMatchObject({ ok: false, error: { code: 'formula-not-allowed' } });
  });

  it('gives typed errors, never NaN or Infinity', () => {
    expect(evaluateFormula('a + b', { a: '2 A', b: '3 m' })).toMatchObject({ ok: false, error: { code: 'wrong-dimension' } });
    expect(evaluateFormula('1/(N - 30)', { N: 30 })).toMatchObject({ ok: false, error: { code: 'division-by-zero' } });
    expect(evaluateFormula('q * 2', {})).toMatchObject({ ok: false, error: { code: 'unknown-variable' } });
    expect(evaluateFormula('sqrt(x)', { x: -1 })).toMatchObject({ ok: false, error: { code: 'not-finite' } });
    expect(evaluateFormula('x^1000', { x: 1e10 })).toMatchObject({ ok: false, error: { code: 'not-finite' } });
    expect(evaluateFormula('sin(a)', { a: '3 m' })).toMatchObject({ ok: false, error: { code: 'wrong-dimension' } });
    expect(evaluateFormula('a', { a: '3 furlongz' })).toMatchObject({ ok: false, error: { code: 'invalid-variable' } });
    expect(evaluateFormula('2 +', {})).toMatchObject({ ok: false, error: { code: 'formula-syntax' } });
    expect(evaluateFormula('  ', {})).toMatchObject({ ok: false, error: { code: 'empty' } });
  });

  it('compiles once, lists the symbols and can be evaluated with many variable sets', () => {
    const compiled = compileFormula('mu0*N*I/(2*a)');
    expect(compiled).toBe(compileFormula('mu0*N*I/(2*a)'));
    if (!compiled.ok) throw new Error('did not compile');
    expect(compiled.symbols).toEqual(['I', 'N', 'a']);
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 500 }), fc.double({ min: 0.01, max: 10, noNaN: true }), (n, amps) => {
        const result = compiled.evaluate({ N: n, I: amps, a: '5 cm' });
        // Independent method: the closed form in plain numbers (I given as a count here is dimensionless).
        const expected = (MU0 * n * amps) / 0.1;
        expect(result.ok && Math.abs(result.value - expected) / expected).toBeLessThan(1e-12);
      }),
    );
  });
});
