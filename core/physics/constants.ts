/** Physical constants for the field models, in SI units. */

/**
 * Vacuum magnetic permeability mu0 in N/A^2 (= T m/A), the CODATA 2018 recommended value
 * 1.25663706212(19) e-6. Since the 2019 SI revision mu0 is measured, not defined.
 */
export const MU0 = 1.25663706212e-6;

/**
 * The pre-2019 exact value 4*pi*1e-7 N/A^2 (fixed by the 1948 ampere definition), the value most
 * school textbooks still print. It differs from MU0 by about 5.4e-10 relative.
 */
export const MU0_TEXTBOOK = 4 * Math.PI * 1e-7;
