import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MU0 } from '../constants';
import { norm, sub, type Vec3 } from '../vector';
import { biotSavart } from './biot-savart';
import { dipoleFieldOnAxis } from './dipole-field';
import { helmholtzFieldOnAxis, loopField, loopFieldOnAxis } from './loop-field';

const relative = (value: number, reference: number) => Math.abs(value - reference) / Math.abs(reference);
const vecRelative = (value: Readonly<Vec3>, reference: Readonly<Vec3>) => norm(sub(value, reference)) / norm(reference);

const coil = { turns: 7, current: 1.3, radius: 0.05 };

/** A circle of the coil's radius in the xy-plane, anticlockwise seen from +z, as a closed polyline. */
function circle(radius: number, segments: number): Vec3[] {
  return Array.from({ length: segments }, (_, i): Vec3 => {
    const t = (2 * Math.PI * i) / segments;
    return [radius * Math.cos(t), radius * Math.sin(t), 0];
  });
}

describe('loopField (closed form with elliptic integrals)', () => {
  const polygon = circle(coil.radius, 20000);
  // Points within 3 radii, at least a quarter radius from the wire (where a 20000-gon is a circle to ~1e-7).
  const offAxisPoint = fc
    .tuple(
      fc.double({ min: 0.02, max: 3, noNaN: true }),
      fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
      fc.double({ min: -2, max: 2, noNaN: true }),
    )
    .filter(([rho, , z]) => Math.hypot(rho - 1, z) >= 0.25)
    .map(([rho, phi, z]): Vec3 => [coil.radius * rho * Math.cos(phi), coil.radius * rho * Math.sin(phi), coil.radius * z]);

  it('agrees with a numerical Biot–Savart sum over a 20000-gon to 1e-6 at 50 random off-axis points', () => {
    // Independent method: Biot–Savart over straight segments (biot-savart.ts) on a finely divided circle.
    fc.assert(
      fc.property(offAxisPoint, (point) => {
        const closedForm = loopField({ ...coil, point });
        const numerical = biotSavart({ path: polygon, current: coil.turns * coil.current, point, closed: true });
        expect(vecRelative(closedForm, numerical)).toBeLessThan(1e-6);
      }),
      { numRuns: 50 },
    );
  });

  it('reduces to loopFieldOnAxis on the axis, and to mu0 N I / (2a) at the centre', () => {
    // Computed: on the axis rho = 0, the field is along z by symmetry.
    for (const z of [-0.3, -0.05, 0, 0.01, 0.2]) {
      expect(loopField({ ...coil, point: [0, 0, z] })).toEqual([0, 0, loopFieldOnAxis({ ...coil, z })]);
    }
    // OpenStax University Physics Volume 2, 12.4: B = mu0 I / (2R) at the centre of a loop (per turn).
    const centre = loopField({ ...coil, point: [0, 0, 0] });
    expect(relative(centre[2], (MU0 * coil.turns * coil.current) / (2 * coil.radius))).toBeLessThan(1e-15);
  });

  it('is continuous where the near-axis expansion takes over, and accurate just off the axis', () => {
    // Independent method: the paraxial expansion B_rho = 3 mu0 N I a^2 z rho / (4 (a^2+z^2)^(5/2)) (from div B = 0).
    const z = 0.03;
    const axial = Math.hypot(coil.radius, z);
    for (const rho of [1e-9 * axial * 0.999, 1e-9 * axial * 1.001, 1e-7 * coil.radius, 1e-5 * coil.radius]) {
      const [bx, , bz] = loopField({ ...coil, point: [rho, 0, z] });
      const paraxial = (3 * MU0 * coil.turns * coil.current * coil.radius ** 2 * z * rho) / (4 * axial ** 5);
      expect(relative(bx, paraxial), `B_rho at rho=${rho}`).toBeLessThan(1e-9);
      expect(relative(bz, loopFieldOnAxis({ ...coil, z })), `B_z at rho=${rho}`).toBeLessThan(1e-9);
    }
  });

  it('has no radial part in the loop plane, and B_z points back (−z) outside the wire there', () => {
    // Computed: mirror symmetry in z = 0; field lines close outside the loop (right-hand rule).
    const [bx, by, bz] = loopField({ ...coil, point: [2 * coil.radius, 0, 0] });
    expect([bx, by]).toEqual([0, 0]);
    expect(bz).toBeLessThan(0);
  });

  it('matches the full dipole field far from the loop', () => {
    // Independent method: point dipole B = (mu0/4pi)(3 (m·r̂) r̂ − m)/r^3, m = N I pi a^2 ẑ; error O((a/r)^2).
    const m = coil.turns * coil.current * Math.PI * coil.radius ** 2;
    for (const dir of [
      [0.6, 0, 0.8],
      [0, 1, 0],
      [0.3, -0.4, -0.866],
    ] as Vec3[]) {
      const r = 1000 * coil.radius;
      const unit = dir.map((c) => c / norm(dir)) as Vec3;
      const point = unit.map((c) => c * r) as Vec3;
      const k = (MU0 / (4 * Math.PI)) * (m / r ** 3);
      const dipole = unit.map((c, i) => k * (3 * unit[2] * c - (i === 2 ? 1 : 0))) as Vec3;
      expect(vecRelative(loopField({ ...coil, point }), dipole)).toBeLessThan(1e-5);
    }
  });

  it('is symmetric under rotation about z and mirror-symmetric in z = 0', () => {
    // Computed: the loop is invariant under rotation about its axis and under z → −z (B_z even, B_rho odd).
    fc.assert(
      fc.property(offAxisPoint, fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), (point, phi) => {
        const [c, s] = [Math.cos(phi), Math.sin(phi)];
        const rotate = ([x, y, z]: Readonly<Vec3>): Vec3 => [c * x - s * y, s * x + c * y, z];
        const b = loopField({ ...coil, point });
        expect(vecRelative(loopField({ ...coil, point: rotate(point) }), rotate(b))).toBeLessThan(1e-12);
        const mirrored = loopField({ ...coil, point: [point[0], point[1], -point[2]] });
        expect(vecRelative(mirrored, [-b[0], -b[1], b[2]])).toBeLessThan(1e-12);
      }),
      { numRuns: 100 },
    );
  });

  it('scales linearly with current and turns, and as 1/size when the whole picture is scaled', () => {
    // Computed: B is linear in N I (superposition) and mu0 N I / length by dimensions.
    fc.assert(
      fc.property(
        offAxisPoint,
        fc.double({ min: -20, max: 20, noNaN: true }).filter((k) => Math.abs(k) > 1e-3),
        fc.integer({ min: 1, max: 500 }),
        fc.double({ min: 0.01, max: 100, noNaN: true }),
        (point, k, turns, size) => {
          const b = loopField({ ...coil, point });
          const byCurrent = loopField({ ...coil, current: k * coil.current, point });
          const byTurns = loopField({ ...coil, turns: turns * coil.turns, point });
          const scaled = loopField({ ...coil, radius: size * coil.radius, point: point.map((x) => x * size) as Vec3 });
          expect(vecRelative(byCurrent, b.map((x) => x * k) as Vec3)).toBeLessThan(1e-13);
          expect(vecRelative(byTurns, b.map((x) => x * turns) as Vec3)).toBeLessThan(1e-13);
          expect(vecRelative(scaled, b.map((x) => x / size) as Vec3)).toBeLessThan(1e-12);
        },
      ),
      { numRuns: 100 },
    );
  });
});

describe('helmholtzFieldOnAxis', () => {
  it('equals (4/5)^(3/2) mu0 N I / R at the midpoint', () => {
    // REFERENCES.md, Helmholtz pair at the midpoint; (4/5)^(3/2) = 0.7155417528 (computed).
    expect((4 / 5) ** 1.5).toBeCloseTo(0.7155417528, 10);
    const b = helmholtzFieldOnAxis({ ...coil, z: 0 });
    expect(relative(b, (0.7155417528 * MU0 * coil.turns * coil.current) / coil.radius)).toBeLessThan(1e-9);
  });

  it('is flat to fourth order near the midpoint', () => {
    // Computed: at coil spacing = R the z^2 term cancels, so B(z) − B(0) ∝ z^4 (ratio 16 when z doubles).
    const b0 = helmholtzFieldOnAxis({ ...coil, z: 0 });
    const d1 = b0 - helmholtzFieldOnAxis({ ...coil, z: 0.05 * coil.radius });
    const d2 = b0 - helmholtzFieldOnAxis({ ...coil, z: 0.1 * coil.radius });
    expect(d2 / b0).toBeLessThan(2e-4);
    expect(d2 / d1).toBeGreaterThan(15);
    expect(d2 / d1).toBeLessThan(17);
  });
});

describe('loopFieldOnAxis against the dipole', () => {
  it('divided by the dipole field equals (z^2/(z^2+R^2))^(3/2), 0.985185 at z = 10R', () => {
    // REFERENCES.md, dipole limit (computed: 0.985185 at z = 10R).
    const moment = coil.turns * coil.current * Math.PI * coil.radius ** 2;
    const z = 10 * coil.radius;
    const ratio = loopFieldOnAxis({ ...coil, z }) / dipoleFieldOnAxis({ moment, z });
    expect(ratio).toBeCloseTo(0.985185, 6);
    for (const zr of [-4, 2, 30, 100]) {
      const zz = zr * coil.radius;
      const r = loopFieldOnAxis({ ...coil, z: zz }) / dipoleFieldOnAxis({ moment, z: zz });
      expect(relative(r, (zz ** 2 / (zz ** 2 + coil.radius ** 2)) ** 1.5)).toBeLessThan(1e-13);
    }
  });
});
