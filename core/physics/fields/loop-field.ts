import { MU0 } from '../constants';
import type { Vec3 } from '../vector';
import { completeElliptic } from './elliptic';
import { FieldPointError, requireFinite, requireNonNegative, requirePositive, requireVec3 } from './field-error';

/** A flat circular coil of `turns` turns in the xy-plane, centred at the origin (SI: A, m). */
export interface LoopInput {
  turns: number;
  current: number;
  radius: number;
}

/** Points closer to the wire than this fraction of the radius count as on it. */
const ON_WIRE = 1e-12;
/** Below this rho / sqrt(a^2 + z^2) the paraxial expansion is exact to double precision. */
const PARAXIAL = 1e-9;

function checkLoop({ turns, current, radius }: LoopInput): void {
  requireNonNegative('turns', turns, 'turns');
  requireFinite('current', current, 'A');
  requirePositive('radius', radius, 'm');
}

/**
 * B_z in T on the axis of the loop at height z (m): mu0 N I a^2 / (2 (a^2 + z^2)^(3/2)).
 * A positive current runs anticlockwise seen from +z and gives B along +z; a negative one reverses it.
 */
export function loopFieldOnAxis(input: LoopInput & { z: number }): number {
  checkLoop(input);
  const { turns, current, radius: a } = input;
  const z = requireFinite('z', input.z, 'm');
  const s = Math.hypot(a, z);
  return (MU0 * turns * current * a * a) / (2 * s * s * s);
}

/**
 * B (T) of the loop at any point (m), closed form of Simpson, Lane, Immer and Youngquist (NASA
 * NTRS 20010038494, 2001) with alpha^2 = (rho − a)^2 + z^2, beta^2 = (rho + a)^2 + z^2,
 * m = 4 a rho / beta^2. The brackets are regrouped through the AGM tail S so that neither the
 * near-axis nor the far-field terms cancel:
 *   B_z   = C K [2a^2 (a^2 + z^2 − rho^2)/beta^2 − (a^2 − r^2) S] / (2 alpha^2 beta),
 *   B_rho = C z K [4 a^2 rho^2 / beta^2 − (a^2 + r^2) S] / (2 alpha^2 beta rho),  C = mu0 N I / pi.
 * On the axis (rho = 0, including the centre) it returns the exact axial field. Throws
 * FieldPointError 'on-conductor' within 1e-12 radii of the wire.
 */
export function loopField(input: LoopInput & { point: Readonly<Vec3> }): Vec3 {
  checkLoop(input);
  const { turns, current, radius: a } = input;
  const [x, y, z] = requireVec3('point', input.point, 'm');
  const rho = Math.hypot(x, y);
  const alpha = Math.hypot(rho - a, z);
  if (alpha <= ON_WIRE * a) {
    throw new FieldPointError(
      'on-conductor',
      `The point (${x}, ${y}, ${z}) m is on the loop's wire, where a thin-wire model has no finite field; move it off the wire.`,
    );
  }
  const axial = Math.hypot(a, z);
  if (rho <= PARAXIAL * axial) {
    // Paraxial expansion: B_z = B_axis(z) + O(rho^2), B_rho = -(rho/2) dB_axis/dz + O(rho^3).
    const bz = (MU0 * turns * current * a * a) / (2 * axial ** 3);
    if (rho === 0) return [0, 0, bz];
    const bRhoOverRho = (3 * MU0 * turns * current * a * a * z) / (4 * axial ** 5);
    return [bRhoOverRho * x, bRhoOverRho * y, bz];
  }
  const beta = Math.hypot(rho + a, z);
  const m = (4 * a * rho) / (beta * beta);
  const { K, tail } = completeElliptic(m, alpha / beta);
  const r2 = rho * rho + z * z;
  const c = (MU0 * turns * current) / Math.PI;
  const front = (c * K) / (2 * alpha * alpha * beta);
  const bz = front * ((2 * a * a * (a * a + z * z - rho * rho)) / (beta * beta) - (a * a - r2) * tail);
  const bRho = ((front * z) / rho) * ((4 * a * a * rho * rho) / (beta * beta) - (a * a + r2) * tail);
  return [(bRho * x) / rho, (bRho * y) / rho, bz];
}

/**
 * B_z in T on the common axis of a Helmholtz pair: two coaxial coils of radius R at z = −R/2 and
 * z = +R/2, each of `turns` turns carrying `current` in the same sense (anticlockwise from +z for
 * a positive current). At the midpoint it is (4/5)^(3/2) mu0 N I / R.
 */
export function helmholtzFieldOnAxis(input: LoopInput & { z: number }): number {
  checkLoop(input);
  const z = requireFinite('z', input.z, 'm');
  const half = input.radius / 2;
  return loopFieldOnAxis({ ...input, z: z - half }) + loopFieldOnAxis({ ...input, z: z + half });
}
