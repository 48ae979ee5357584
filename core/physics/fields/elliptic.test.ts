import ellipe from '@stdlib/math-base-special-ellipe';
import ellipk from '@stdlib/math-base-special-ellipk';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { completeElliptic, ellipticE, ellipticK } from './elliptic';

const relative = (value: number, reference: number) => Math.abs(value - reference) / Math.abs(reference);

describe('complete elliptic integrals by the AGM', () => {
  it('match the tabulated K(0.5), E(0.5) and K(0) = E(0) = pi/2', () => {
    // Abramowitz & Stegun, Handbook of Mathematical Functions (1964), Table 17.1 (table number from memory), m = k^2: K(m=0.5) = 1.8540746773013719, E(m=0.5) = 1.3506438810476755.
    expect(relative(ellipticK(0.5), 1.8540746773013719)).toBeLessThan(1e-15);
    expect(relative(ellipticE(0.5), 1.3506438810476755)).toBeLessThan(1e-15);
    // Standard tables: K(0) = E(0) = pi/2 (the integrands are 1).
    expect(ellipticK(0)).toBe(Math.PI / 2);
    expect(ellipticE(0)).toBe(Math.PI / 2);
  });

  it('agree with @stdlib ellipk/ellipe on a grid of m from -5 to 1 - 1e-12', () => {
    // Independent method: @stdlib/math-base-special-ellipk 0.2.4 and -ellipe 0.3.1 (same m = k^2 convention).
    const grid = [-5, -1, -0.25, 1e-12, 1e-6, 0.01, 0.1, 0.3, 0.5, 0.7, 0.9, 0.99, 0.9999, 1 - 1e-8, 1 - 1e-12];
    for (const m of grid) {
      expect(relative(ellipticK(m), ellipk(m)), `K(${m})`).toBeLessThan(1e-13);
      expect(relative(ellipticE(m), ellipe(m)), `E(${m})`).toBeLessThan(1e-13);
    }
  });

  it('agree with @stdlib at random m in [0, 1)', () => {
    // Independent method: @stdlib reference implementations.
    fc.assert(
      fc.property(fc.double({ min: 0, max: 0.999999, noNaN: true }), (m) => {
        const { K, E } = completeElliptic(m);
        return relative(K, ellipk(m)) < 1e-13 && relative(E, ellipe(m)) < 1e-13;
      }),
      { numRuns: 300 },
    );
  });

  it("satisfy Legendre's relation E K' + E' K − K K' = pi/2", () => {
    // Legendre's relation for complementary parameters m and 1 − m (DLMF 19.7.1, from memory).
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1 - 1e-6, noNaN: true }), (m) => {
        const a = completeElliptic(m);
        const b = completeElliptic(1 - m);
        return Math.abs(a.E * b.K + b.E * a.K - a.K * b.K - Math.PI / 2) < 1e-13;
      }),
      { numRuns: 200 },
    );
  });

  it('uses an accurate complementary modulus when given one', () => {
    // Independent method: @stdlib at m = 1 − 1e-14, where 1 − m cannot be formed exactly but k' = 1e-7 can.
    const m = 1 - 1e-14;
    expect(relative(completeElliptic(m, 1e-7).K, ellipk(m))).toBeLessThan(1e-3);
    expect(completeElliptic(m, 1e-7).K).toBeCloseTo(Math.log(4 / 1e-7), 12); // K ≈ ln(4/k') as k' → 0 (from memory)
  });

  it('refuse m ≥ 1 and non-finite m with a RangeError', () => {
    expect(() => ellipticK(1)).toThrow(RangeError);
    expect(() => ellipticE(2)).toThrow(/m < 1/);
    expect(() => ellipticK(Number.NaN)).toThrow(RangeError);
  });
});
