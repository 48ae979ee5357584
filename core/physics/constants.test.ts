import { describe, expect, it } from 'vitest';
import { MU0, MU0_TEXTBOOK } from './constants';

describe('MU0', () => {
  it('is the CODATA 2018 value of the vacuum magnetic permeability', () => {
    // NIST, CODATA 2018 recommended values ("Fundamental Physical Constants — Extensive Listing"): 1.25663706212(19)e-6 N A^-2.
    expect(MU0).toBe(1.25663706212e-6);
  });

  it('keeps the pre-2019 exact value 4 pi 1e-7 alongside, within the CODATA 2018 uncertainty of it', () => {
    // The 1948 ampere definition (IEC Electropedia 121-11-14): mu0 = 4 pi e-7 N A^-2 exactly.
    expect(MU0_TEXTBOOK).toBe(4 * Math.PI * 1e-7);
    // CODATA 2018 lists mu0 / (4 pi e-7) = 1.000 000 000 55(15) (from memory); the rounded MU0 gives 1 + 5.44e-10.
    expect(Math.abs(MU0 / MU0_TEXTBOOK - 1 - 5.5e-10)).toBeLessThan(1.5e-10);
  });
});
