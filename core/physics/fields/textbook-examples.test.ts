import { describe, expect, it } from 'vitest';
import { MU0 } from '../constants';
import { biotSavart } from './biot-savart';
import { loopField, loopFieldOnAxis } from './loop-field';
import { needleDeflection } from './needle-deflection';
import { solenoidFieldOnAxis } from './solenoid-field';
import { wireField } from './wire-field';

/** The value rounded to n significant figures ("TA" in REFERENCES.md: rounds to the printed value). */
const sig = (x: number, n: number) => Number(x.toPrecision(n));

describe('OpenStax University Physics Volume 2 (CC BY 4.0) worked examples', () => {
  it('12.4 Example "Magnetic Field between Two Loops": 5.77e-9 T', () => {
    // OpenStax University Physics Vol. 2, 12.4 Magnetic Field of a Current Loop, Example "Magnetic Field between
    // Two Loops": I = 10 mA in opposite senses; R1 = 0.5 m at 0.25 m, R2 = 1.0 m at 0.75 m; B = 5.77e-9 T.
    const first = loopFieldOnAxis({ turns: 1, current: 0.01, radius: 0.5, z: 0.25 });
    const second = loopFieldOnAxis({ turns: 1, current: -0.01, radius: 1.0, z: -0.75 });
    expect(sig(Math.abs(first + second), 3)).toBe(5.77e-9);
    // The same point through the off-axis closed form (the second loop centred at z = 1.0 m).
    const [, , bz1] = loopField({ turns: 1, current: 0.01, radius: 0.5, point: [0, 0, 0.25] });
    const [, , bz2] = loopField({ turns: 1, current: -0.01, radius: 1.0, point: [0, 0, -0.75] });
    expect(sig(Math.abs(bz1 + bz2), 3)).toBe(5.77e-9);
  });

  it('12.6 Example "Magnetic Field Inside a Solenoid": N = 300, L = 14.0 cm, I = 0.410 A gives 1.10e-3 T', () => {
    // OpenStax University Physics Vol. 2, 12.6 Solenoids and Toroids, Example: B = mu0 n I = 1.10e-3 T for a long
    // solenoid. The example gives no radius; a thin one (2 mm) is long in the example's sense.
    const b = solenoidFieldOnAxis({ turns: 300, length: 0.14, radius: 0.002, current: 0.41, z: 0 });
    expect(sig(b, 3)).toBe(1.1e-3);
  });

  it('12.6: the finite solenoid tends to mu0 n I at the centre and mu0 n I / 2 at the ends as it gets long', () => {
    // OpenStax University Physics Vol. 2, 12.6: inside a long solenoid B = mu0 n I; the end value n I mu0 / 2 is
    // the standard half-field result (from memory). Deficit at the centre 2 R^2/L^2 + O(R^4/L^4) (computed).
    const n = 300 / 0.14;
    const ideal = MU0 * n * 0.41;
    let previous = Infinity;
    for (const ratio of [10, 100, 1000]) {
      const length = 0.14;
      const radius = length / ratio;
      const centre = solenoidFieldOnAxis({ turns: n * length, length, radius, current: 0.41, z: 0 });
      const deficit = 1 - centre / ideal;
      expect(deficit).toBeGreaterThan(0);
      expect(deficit).toBeLessThan(previous);
      expect(relative(deficit, 2 / ratio ** 2)).toBeLessThan(4 / ratio ** 2);
      previous = deficit;
    }
    const end = solenoidFieldOnAxis({ turns: 3000, length: 1.4, radius: 0.0014, current: 0.41, z: 0.7 });
    expect(relative(end, ideal / 2)).toBeLessThan(1e-5);
  });

  it('12.6: the solenoid formula equals a sum of many thin loops, inside and outside', () => {
    // Independent method: superposition of 4000 coaxial loops (midpoint rule) from loopFieldOnAxis.
    const [turns, length, radius, current] = [300, 0.14, 0.02, 0.41];
    const count = 4000;
    for (const z of [0, 0.03, 0.07, 0.1, -0.25]) {
      let sum = 0;
      for (let i = 0; i < count; i += 1) {
        const zi = -length / 2 + ((i + 0.5) * length) / count;
        sum += loopFieldOnAxis({ turns: turns / count, current, radius, z: z - zi });
      }
      expect(relative(solenoidFieldOnAxis({ turns, length, radius, current, z }), sum), `z = ${z}`).toBeLessThan(1e-6);
    }
  });

  it('12.2 Example "Calculating Magnetic Field Due to Three Wires": I = 2 A at 0.01 m gives 4e-5 T', () => {
    // OpenStax University Physics Vol. 2, 12.2 Magnetic Field Due to a Thin Straight Wire: mu0 I / (2 pi R) = 4e-5 T.
    expect(relative(wireField({ current: 2, distance: 0.01 }), 4e-5)).toBeLessThan(1e-9);
    // Independent method: Biot–Savart over a straight segment 2 km long, at 1 cm from its middle.
    const b = biotSavart({
      path: [
        [0, 0, -1000],
        [0, 0, 1000],
      ],
      current: 2,
      point: [0.01, 0, 0],
    });
    expect(relative(b[1], 4e-5)).toBeLessThan(1e-9);
  });

  it('12.4 end-of-chapter problem: I = 6.0 A and B = 2.0e-4 T at the centre give R = 0.019 m', () => {
    // OpenStax University Physics Vol. 2, 12.4, end-of-chapter problem: R = mu0 I / (2 B) = 0.019 m.
    const radius = (MU0 * 6.0) / (2 * 2.0e-4);
    expect(sig(radius, 2)).toBe(0.019);
    expect(sig(loopFieldOnAxis({ turns: 1, current: 6.0, radius, z: 0 }), 2)).toBe(2.0e-4);
    expect(sig(loopFieldOnAxis({ turns: 1, current: 6.0, radius: 0.019, z: 0 }), 2)).toBe(2.0e-4);
  });
});

describe('NCERT Physics Part I, class XII, chapter 5, exercise 5.20(a): tangent galvanometer', () => {
  // N = 30, r = 12 cm, I = 0.35 A; coil plane at 45° to the meridian; the needle points west to east.
  // Printed: B_coil = 5.49e-5 T, B_H = 3.88e-5 T from truncated intermediates (exact 5.498e-5, 3.888e-5): 2 s.f.
  const coilField = loopFieldOnAxis({ turns: 30, current: 0.35, radius: 0.12, z: 0 });

  it('gives the coil field at the centre, 5.5e-5 T, and B_H = 3.9e-5 T', () => {
    expect(sig(coilField, 2)).toBe(5.5e-5);
    // The coil's axis is at 135° from north (south-east); a needle pointing east means the north components cancel.
    const earth = -coilField * Math.cos((135 * Math.PI) / 180);
    expect(sig(earth, 2)).toBe(3.9e-5);
    expect(needleDeflection({ coilField, earthHorizontalField: earth, angle: 135 })).toBeCloseTo(90, 9);
  });

  it('5.20(b): current reversed and coil turned 90° anticlockwise seen from above, the needle points east to west', () => {
    // NCERT exercise 5.20(b): the needle reverses, pointing west. Reversed field at 315°, turned anticlockwise by 90°: 225°.
    const earth = -coilField * Math.cos((135 * Math.PI) / 180);
    expect(Math.abs(needleDeflection({ coilField, earthHorizontalField: earth, angle: 225 }))).toBeCloseTo(90, 9);
    expect(needleDeflection({ coilField, earthHorizontalField: earth, angle: 225 })).toBeLessThan(0);
  });
});

describe('needleDeflection', () => {
  it('follows the tangent law tan θ = B_coil / B_H for the default 90°', () => {
    // REFERENCES.md, tangent law: tan(theta) = B_coil / B_H.
    const earth = 1.8e-5;
    for (const coil of [0, 1e-6, 1.8e-5, 5e-5, -3e-5]) {
      const theta = needleDeflection({ coilField: coil, earthHorizontalField: earth });
      expect(theta).toBeCloseTo((Math.atan(coil / earth) * 180) / Math.PI, 10);
    }
    expect(needleDeflection({ coilField: 1.8e-5, earthHorizontalField: 1.8e-5 })).toBeCloseTo(45, 12);
  });

  it('lines up with the vector sum for other angles', () => {
    // Computed: along the coil's field when there is no Earth field; unmoved when the coil field lies along north.
    expect(needleDeflection({ coilField: 2e-5, earthHorizontalField: 0, angle: 60 })).toBeCloseTo(60, 10);
    expect(needleDeflection({ coilField: 2e-5, earthHorizontalField: 1e-5, angle: 0 })).toBe(0);
    expect(needleDeflection({ coilField: 2e-5, earthHorizontalField: 1e-5, angle: 180 })).toBe(180);
    expect(() => needleDeflection({ coilField: 1e-5, earthHorizontalField: 1e-5, angle: 180 })).toThrow(/cancels/);
  });
});

function relative(value: number, reference: number) {
  return Math.abs(value - reference) / Math.abs(reference);
}
