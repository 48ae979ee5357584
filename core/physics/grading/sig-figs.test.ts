import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { correctlyRoundedAt, describeFigureRange, figuresAllowed, roundToSigFigs, sigFigRuleProblem } from './sig-figs';
import { withinBand, withinTolerance } from './tolerance';

describe('roundToSigFigs', () => {
  it('rounds as taught, half away from zero', () => {
    // OpenStax University Physics Volume 1, 1.6 Significant Figures (rounding to the allowed figures).
    expect(roundToSigFigs(0.01049, 2)).toBe(0.01);
    expect(roundToSigFigs(62.83185, 3)).toBe(62.8);
    expect(roundToSigFigs(6.35e-5, 2)).toBe(6.4e-5); // common practice: 5 rounds up, even when stored as 6.3499…e-5
    expect(roundToSigFigs(-0.0105, 2)).toBe(-0.011);
    expect(roundToSigFigs(12345, 2)).toBe(12000);
    expect(roundToSigFigs(0, 3)).toBe(0);
  });

  it('refuses a figure count that is not a whole number from 1 to 100', () => {
    expect(() => roundToSigFigs(1, 0)).toThrow('Significant figures must be a whole number from 1 to 100; got 0.');
    expect(() => roundToSigFigs(1, 2.5)).toThrow('got 2.5');
  });

  it('is idempotent and stays within half a unit in the last place (property, common practice)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-12, max: 1e12, noNaN: true }), fc.integer({ min: 1, max: 12 }), (v, n) => {
        const r = roundToSigFigs(v, n);
        expect(roundToSigFigs(r, n)).toBe(r);
        const ulp = 10 ** (Math.floor(Math.log10(v)) - n + 1);
        expect(Math.abs(r - v)).toBeLessThanOrEqual(ulp * 0.5 * (1 + 1e-9) + Math.abs(v) * 1e-15);
      }),
    );
  });
});

describe('figuresAllowed', () => {
  it('lets trailing zeros without a point count under either reading', () => {
    // '6300' may have 2, 3 or 4 figures (OpenStax University Physics Volume 1, 1.6): any overlap with the rule is allowed.
    expect(figuresAllowed({ min: 2, max: 4 }, { min: 3, max: 3 })).toBe(true);
    expect(figuresAllowed({ min: 2, max: 4 }, { min: 4, max: 5 })).toBe(true);
    expect(figuresAllowed({ min: 2, max: 4 }, { min: 5, max: 6 })).toBe(false);
    expect(figuresAllowed({ min: 5, max: 5 }, { min: 2, max: 3 })).toBe(false);
  });
});

describe('correctlyRoundedAt and the sig-fig allowance', () => {
  const rule = { min: 2, max: 3 };
  const tol = { relative: 0.02, absolute: 0 };

  it('accepts 0.010 T for an expected 0.01049 T at two figures, though 4.7 % off (issue 3 example)', () => {
    expect(withinBand(0.01, 0.01049, tol)).toBe(false);
    expect(correctlyRoundedAt(0.01, { min: 2, max: 2 }, 0.01049, 1, rule)).toBe(2);
    expect(withinTolerance({ value: 0.01, magnitude: 0.01, sigFigs: { min: 2, max: 2 } }, 0.01049, tol, rule)).toBe(2);
  });

  it('judges rounding in the student’s unit: 10 mT (1 or 2 figures) also rounds 0.01049 T', () => {
    expect(correctlyRoundedAt(10, { min: 1, max: 2 }, 0.01049, 1e-3, rule)).toBe(2);
  });

  it('does not accept a number rounded wrongly or to a figure count outside the rule', () => {
    expect(correctlyRoundedAt(0.011, { min: 2, max: 2 }, 0.01049, 1, rule)).toBeNull();
    // 0.01 has one figure, below the rule's minimum of two.
    expect(correctlyRoundedAt(0.01, { min: 1, max: 1 }, 0.01049, 1, rule)).toBeNull();
    expect(withinTolerance({ value: 0.01, magnitude: 0.01, sigFigs: { min: 1, max: 1 } }, 0.01049, tol, rule)).toBe(false);
    // Without a rule there is no allowance.
    expect(withinTolerance({ value: 0.01, magnitude: 0.01, sigFigs: { min: 2, max: 2 } }, 0.01049, tol, undefined)).toBe(false);
  });

  it('describes ranges and checks rules', () => {
    expect(describeFigureRange({ min: 2, max: 2 })).toBe('2');
    expect(describeFigureRange({ min: 2, max: 3 })).toBe('2 or 3');
    expect(describeFigureRange({ min: 2, max: 4 })).toBe('2 to 4');
    expect(sigFigRuleProblem({ min: 2, max: 3 })).toBeNull();
    expect(sigFigRuleProblem({ min: 3, max: 2 })).toBe("A significant-figure rule's minimum (3) is above its maximum (2).");
    expect(sigFigRuleProblem({ min: 2, max: 3, penalty: 2 })).toBe('A significant-figure penalty must be from 0 to 1; got 2.');
  });
});

describe('withinBand', () => {
  it('is symmetric about the target for relative and absolute tolerance (property, common practice)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-9, max: 1e3, noNaN: true }),
        fc.constantFrom(1, -1),
        fc.double({ min: 0.001, max: 0.2, noNaN: true }),
        fc.double({ min: 0, max: 0.999, noNaN: true }),
        fc.double({ min: 1.001, max: 3, noNaN: true }),
        (size, sign, r, inside, outside) => {
          const e = sign * size;
          const rel = { relative: r, absolute: 0 };
          expect(withinBand(e * (1 + r * inside), e, rel)).toBe(true);
          expect(withinBand(e * (1 - r * inside), e, rel)).toBe(true);
          expect(withinBand(e * (1 + r * outside), e, rel)).toBe(false);
          expect(withinBand(e * (1 - r * outside), e, rel)).toBe(false);
          const abs = { relative: 0, absolute: r * size };
          expect(withinBand(e + abs.absolute * inside, e, abs)).toBe(withinBand(e - abs.absolute * inside, e, abs));
          expect(withinBand(e + abs.absolute * outside, e, abs)).toBe(false);
          expect(withinBand(e - abs.absolute * outside, e, abs)).toBe(false);
        },
      ),
    );
  });

  it('passes an answer exactly on the 2 % edge on both sides (common practice)', () => {
    const tol = { relative: 0.02, absolute: 0 };
    expect(withinBand(62.8e-6 * 1.02, 62.8e-6, tol)).toBe(true);
    expect(withinBand(62.8e-6 * 0.98, 62.8e-6, tol)).toBe(true);
    expect(withinBand(62.8e-6 * 1.0201, 62.8e-6, tol)).toBe(false);
  });
});
