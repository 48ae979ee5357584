/**
 * The expected answer of the tests' numeric checkpoint, worked out here by hand rather than by the
 * product's engine: the field at the centre of a flat coil, B = μ0·N·I / (2a) (OpenStax University
 * Physics Vol. 2, §12.4, "Magnetic Field of a Current Loop"), μ0 = 4π × 10⁻⁷ T·m/A.
 */

const MU0 = 4 * Math.PI * 1e-7;

/** Metres or amperes per unit, for the only units the tests' variables are written in. */
const SI_FACTOR: Record<string, number> = { '': 1, m: 1, cm: 1e-2, mm: 1e-3, A: 1, mA: 1e-3 };

/** A drawn value as the student view writes it ('3.5 cm', '20', '1.5 A') in SI units. */
export function siValue(text: string): number {
  const match = /^\s*(-?\d+(?:\.\d+)?)\s*([a-zA-Z]*)\s*$/.exec(text);
  const factor = match ? SI_FACTOR[match[2] ?? ''] : undefined;
  if (!match || factor === undefined) throw new Error(`Cannot read the drawn value “${text}” (expected a number and cm, mm, m, A or mA).`);
  return Number(match[1]) * factor;
}

/** B at the centre of a flat coil in microtesla, from the student's drawn values N, a and I. */
export function coilCentreFieldMicrotesla(values: Readonly<Record<string, string>>): number {
  const read = (name: string) => {
    const text = values[name];
    if (text === undefined) throw new Error(`The student view has no drawn value for ${name}: ${JSON.stringify(values)}`);
    return siValue(text);
  };
  return ((MU0 * read('N') * read('I')) / (2 * read('a'))) * 1e6;
}

/** A value as a student would type it, to four significant figures, with its unit. */
export function typed(value: number, unit: string): string {
  return `${Number(value.toPrecision(4))} ${unit}`;
}
