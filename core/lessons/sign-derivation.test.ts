import { describe, expect, it } from 'vitest';
import type { SignChoiceSet, SignGeometry } from '../contracts/checkpoints';
import { biotSavart, fieldDirection } from '../physics/fields/index';
import type { Vec3 } from '../physics/vector';
import { deriveSignAnswer, signGeometryField } from './sign-derivation';

type Conductor = SignGeometry['conductor'];
const loop = (axis: 'x' | 'y' | 'z', current: 'clockwise' | 'anticlockwise', center: Vec3 = [0, 0, 0], radius = 0.05): Conductor => ({
  shape: 'loop',
  center,
  radius,
  axis,
  current,
});
const wire = (axis: 'x' | 'y' | 'z', current: '+' | '-', through: Vec3 = [0, 0, 0]): Conductor => ({
  shape: 'wire',
  through,
  axis,
  current,
});
const setUp = (conductor: Conductor, point: Vec3, component: 'x' | 'y' | 'z' = 'z'): SignGeometry => ({ conductor, point, component });

function derived(geometry: SignGeometry, set: SignChoiceSet): string {
  const result = deriveSignAnswer(geometry, set);
  if (!result.ok) throw new Error(`refused: ${result.message}`);
  return result.choice;
}

/** An independent method: the loop as a 720-gon (or the wire as a ±2 km segment) summed by the engine's Biot–Savart. */
function polylineField(geometry: SignGeometry): Vec3 {
  const { conductor, point } = geometry;
  const index = { x: 0, y: 1, z: 2 } as const;
  if (conductor.shape === 'wire') {
    const sign = conductor.current === '+' ? 1 : -1;
    const start: Vec3 = [...conductor.through];
    const end: Vec3 = [...conductor.through];
    start[index[conductor.axis]] -= 2000 * sign;
    end[index[conductor.axis]] += 2000 * sign;
    return biotSavart({ path: [start, end], current: 1, point });
  }
  // (e1, e2, axis) right-handed, so increasing t runs anticlockwise seen from the +axis side.
  const plane = { z: [0, 1], x: [1, 2], y: [2, 0] } as const;
  const [i, j] = plane[conductor.axis];
  const sense = conductor.current === 'anticlockwise' ? 1 : -1;
  const path = Array.from({ length: 720 }, (_, k) => {
    const t = (sense * 2 * Math.PI * k) / 720;
    const p: Vec3 = [...conductor.center];
    p[i] += conductor.radius * Math.cos(t);
    p[j] += conductor.radius * Math.sin(t);
    return p;
  });
  return biotSavart({ path, current: 1, point, closed: true });
}

describe('deriveSignAnswer: right-hand rule cases', () => {
  // OpenStax University Physics Volume 2, §12.4 Magnetic Field of a Current Loop (right-hand rule 2):
  // a loop with anticlockwise current seen from +z has its field along +z at its centre.
  it('gives +z at the centre of a loop anticlockwise seen from +z, −z when clockwise', () => {
    expect(derived(setUp(loop('z', 'anticlockwise'), [0, 0, 0]), 'axis')).toBe('+z');
    expect(derived(setUp(loop('z', 'clockwise'), [0, 0, 0]), 'axis')).toBe('-z');
    // Same section: on the axis the field keeps the centre's direction on both sides of the loop.
    expect(derived(setUp(loop('z', 'anticlockwise'), [0, 0, -0.04]), 'axis')).toBe('+z');
  });

  // OpenStax Vol. 2 §12.4, the same rule for a loop about another axis; the frame is right-handed.
  it('follows the loop axis for loops about x and y, and a shifted centre', () => {
    expect(derived(setUp(loop('x', 'anticlockwise'), [0.01, 0, 0]), 'axis')).toBe('+x');
    expect(derived(setUp(loop('x', 'clockwise'), [0.01, 0, 0]), 'axis')).toBe('-x');
    expect(derived(setUp(loop('y', 'anticlockwise'), [0, 0.3, 0]), 'axis')).toBe('+y');
    expect(derived(setUp(loop('z', 'clockwise', [0.2, -0.1, 0.5]), [0.2, -0.1, 0.52]), 'axis')).toBe('-z');
  });

  // OpenStax Vol. 2 §12.4: a loop in the page with anticlockwise current has its field out of the page
  // inside it; the page is the xy-plane seen from +z.
  it('gives out of the page inside an anticlockwise loop drawn in the page', () => {
    expect(derived(setUp(loop('z', 'anticlockwise'), [0.01, 0.01, 0]), 'page')).toBe('out');
    expect(derived(setUp(loop('z', 'clockwise'), [0.01, 0.01, 0]), 'page')).toBe('into');
  });

  // OpenStax Vol. 2 §12.2 Magnetic Field Due to a Thin Straight Wire (right-hand rule 2): a wire along +z
  // has field lines anticlockwise seen from above: +y at a point on +x, −x at a point on +y.
  it('gives the field circling a wire along +z anticlockwise seen from above', () => {
    expect(derived(setUp(wire('z', '+'), [0.01, 0, 0]), 'axis')).toBe('+y');
    expect(derived(setUp(wire('z', '+'), [0, 0.01, 0]), 'axis')).toBe('-x');
    expect(derived(setUp(wire('z', '+'), [-0.01, 0, 0.7]), 'axis')).toBe('-y');
    expect(derived(setUp(wire('z', '-'), [0.01, 0, 0]), 'axis')).toBe('-y');
  });

  // OpenStax Vol. 2 §12.2: a current to the right in the page has its field out of the page above
  // the wire and into the page below it.
  it('gives out of the page above a wire carrying current to the right, into it below', () => {
    expect(derived(setUp(wire('x', '+'), [0, 0.01, 0]), 'page')).toBe('out');
    expect(derived(setUp(wire('x', '+'), [0, -0.01, 0]), 'page')).toBe('into');
    expect(derived(setUp(wire('x', '-', [0, 0.02, 0]), [0.3, 0, 0]), 'page')).toBe('out');
  });

  // OpenStax Vol. 2 §12.4 (field on the axis of a loop is along the axis): the sign of each component.
  it('gives the sign of the asked component, and 0 for one the symmetry makes zero', () => {
    expect(derived(setUp(loop('z', 'anticlockwise'), [0, 0, 0.02], 'z'), 'sign')).toBe('+');
    expect(derived(setUp(loop('z', 'clockwise'), [0, 0, 0.02], 'z'), 'sign')).toBe('-');
    expect(derived(setUp(loop('z', 'anticlockwise'), [0, 0, 0.02], 'x'), 'sign')).toBe('0');
    // §12.2: a wire along +z, point on +x: B along +y, so B_y > 0 and B_z = 0.
    expect(derived(setUp(wire('z', '+'), [0.01, 0, 0], 'y'), 'sign')).toBe('+');
    expect(derived(setUp(wire('z', '+'), [0.01, 0, 0], 'z'), 'sign')).toBe('0');
  });
});

describe('deriveSignAnswer agrees with a numerical Biot–Savart sum (independent method)', () => {
  const cases: SignGeometry[] = [
    setUp(loop('z', 'anticlockwise'), [0.01, 0.02, 0.03]),
    setUp(loop('x', 'clockwise', [0.1, 0, 0]), [0.13, 0.01, -0.01]),
    setUp(loop('y', 'anticlockwise', [0, 0, 0.2]), [0.02, -0.05, 0.21]),
    setUp(loop('z', 'clockwise'), [0.07, 0, 0.001]),
    setUp(wire('y', '-', [0.05, 0, 0]), [0.06, 3, 0.02]),
    setUp(wire('x', '+', [0, 0.1, -0.1]), [-2, 0.12, -0.13]),
  ];
  it.each(cases.map((geometry, i) => [i, geometry] as const))('case %i: same field vector and direction', (_, geometry) => {
    const engine = signGeometryField(geometry);
    const numeric = polylineField(geometry);
    const size = Math.hypot(...numeric);
    for (let k = 0; k < 3; k += 1) expect(Math.abs((engine[k] as number) - (numeric[k] as number))).toBeLessThan(1e-3 * size);
    expect(fieldDirection(engine).direction).toBe(fieldDirection(numeric).direction);
  });
});

describe('deriveSignAnswer refusals', () => {
  it('refuses the rotation set: it has no field direction to derive', () => {
    const result = deriveSignAnswer(setUp(loop('z', 'anticlockwise'), [0, 0, 0]), 'rotation');
    expect(result).toEqual({ ok: false, message: expect.stringContaining('Set the answer by hand for clockwise/anticlockwise.') });
  });

  it('refuses a point with no clearly dominant direction and says the share', () => {
    // A point at 45° from a wire along z: B has equal x and y parts, 71 % each (1/√2).
    const result = deriveSignAnswer(setUp(wire('z', '+'), [0.01, 0.01, 0]), 'axis');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toContain('no clearly dominant direction (largest component 71 % of the field)');
  });

  it('refuses a point where the field is below the engine threshold', () => {
    const result = deriveSignAnswer(setUp(loop('z', 'anticlockwise', [0, 0, 0], 0.01), [1000, 0, 0]), 'axis');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toMatch(/^The field is zero at that point/);
  });

  it('refuses a point on the conductor, for the loop and for the wire', () => {
    const onLoop = deriveSignAnswer(setUp(loop('z', 'anticlockwise'), [0.05, 0, 0]), 'axis');
    const onWire = deriveSignAnswer(setUp(wire('z', '+'), [0, 0, 0.3]), 'page');
    expect(onLoop.ok || onLoop.message).toMatch(/^The field point is on the conductor\./);
    expect(onWire.ok || onWire.message).toMatch(/^The field point is on the conductor\./);
  });

  it('refuses the page set when the field lies in the page', () => {
    const result = deriveSignAnswer(setUp(wire('z', '+'), [0.01, 0, 0]), 'page');
    expect(result.ok || result.message).toBe(
      'The field there lies in the page (along +y), not into or out of it. Use the axis choices or move the point.',
    );
  });

  it('refuses a sign asked of a component that is small but not zero', () => {
    // Just off the axis of a loop: B_x is a tiny fraction of B_z.
    const result = deriveSignAnswer(setUp(loop('z', 'anticlockwise'), [0.001, 0, 0.02], 'x'), 'sign');
    expect(result.ok || result.message).toMatch(/^The x component there is small but not zero/);
  });

  it('refuses a set-up the engine cannot compute, with its message', () => {
    const result = deriveSignAnswer(setUp(loop('z', 'anticlockwise', [0, 0, 0], -0.05), [0, 0, 0]), 'axis');
    expect(result.ok || result.message).toMatch(/^The set-up cannot be computed\. radius must be greater than zero/);
  });
});
