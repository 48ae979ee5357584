import { describe, expect, it } from 'vitest';
import { MU0 } from '../constants';
import { FORMULA_CONSTANTS, math } from './math.ts';

describe('the engine mathjs instance', () => {
  it.each(['import', 'createUnit', 'evaluate', 'parse', 'compile', 'simplify', 'derivative', 'resolve', 'reviver', 'parser'])(
    '%s is disabled',
    (name) => {
      const fn = (math as unknown as Record<string, () => unknown>)[name];
      expect(typeof fn).toBe('function');
      expect(() => fn?.()).toThrow(/disabled/);
    },
  );

  it('defines gauss: 1 G = 1e-4 T (BIPM SI Brochure 8th ed. 2006, Table 9; NIST SP 811, Table 10)', () => {
    expect(math.unit(1, 'G').toNumber('T')).toBeCloseTo(1e-4, 18);
    expect(math.unit(1, 'gauss').toNumber('T')).toBeCloseTo(1e-4, 18);
    expect(math.unit(630, 'mG').toNumber('uT')).toBeCloseTo(63, 10);
    expect(math.unit(1, 'milligauss').toNumber('T')).toBeCloseTo(1e-7, 20);
  });

  it('holds mu0 at the CODATA 2018 value (NIST, CODATA 2018 recommended values)', () => {
    expect(MU0).toBe(1.25663706212e-6);
    expect(FORMULA_CONSTANTS.mu0).toEqual({ value: 1.25663706212e-6, unit: 'N/A^2' });
    // mathjs documents magneticConstant = 1.25663706212e-6 N/A^2 (a general reference library).
    expect(math.unit(MU0, 'N/A^2').toNumber('H/m')).toBeCloseTo(1.25663706212e-6, 17);
    // Before 2019 the value was exactly 4 pi 1e-7 (IEC 121-11-14); CODATA 2018 differs by under 1e-9 relative.
    expect(Math.abs(MU0 / (4 * Math.PI * 1e-7) - 1)).toBeLessThan(1e-9);
  });

  it('has pi and e as constants', () => {
    expect(FORMULA_CONSTANTS.pi?.value).toBe(Math.PI);
    expect(FORMULA_CONSTANTS.e?.value).toBe(Math.E);
  });
});
