import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Vec3 } from '../vector';
import { biotSavart } from './biot-savart';
import { circulation } from './circulation';
import { fieldDirection } from './field-direction';
import { loopField } from './loop-field';

const ring = (n: number, at: (t: number) => Vec3): Vec3[] => Array.from({ length: n }, (_, i) => at((2 * Math.PI * i) / n));
const anticlockwise = ring(12, (t) => [Math.cos(t), Math.sin(t), 0]);

describe('fieldDirection', () => {
  it('names the dominant component and its share of |B|', () => {
    // Computed: |(3, −4, 0)| = 5, so −y with share 0.8.
    expect(fieldDirection([3e-5, -4e-5, 0])).toEqual({ direction: '-y', share: 0.8 });
    expect(fieldDirection([0, 0, -2e-3])).toEqual({ direction: '-z', share: 1 });
    const diagonal = fieldDirection([1e-6, 1e-6, 0]);
    expect(diagonal.direction).toBe('+x'); // a tie goes to x, then y
    expect(diagonal.share).toBeCloseTo(Math.SQRT1_2, 15);
  });

  it("reports 'zero' below 1e-12 T by default, or below a given threshold", () => {
    expect(fieldDirection([1e-13, 0, 0])).toEqual({ direction: 'zero', share: 0 });
    expect(fieldDirection([1e-13, 0, 0], { threshold: 1e-15 }).direction).toBe('+x');
    expect(fieldDirection([2e-6, 0, 0], { threshold: 1e-5, view: 'page' }).direction).toBe('zero');
    expect(() => fieldDirection([1, 0, 0], { threshold: -1 })).toThrow(/threshold/);
    expect(() => fieldDirection([Number.NaN, 0, 0])).toThrow(expect.objectContaining({ code: 'invalid-input' }));
  });

  it("uses page words with { view: 'page' }: +z out, −z into, +y up, −y down, +x right, −x left", () => {
    const page = (b: Vec3) => fieldDirection(b, { view: 'page' }).direction;
    expect([page([0, 0, 1]), page([0, 0, -1]), page([0, 1, 0]), page([0, -1, 0]), page([1, 0, 0]), page([-1, 0, 0])]).toEqual([
      'out',
      'into',
      'up',
      'down',
      'right',
      'left',
    ]);
  });

  it('flips with the field', () => {
    fc.assert(
      fc.property(
        fc.tuple(
          fc.double({ min: -1, max: 1, noNaN: true }),
          fc.double({ min: -1, max: 1, noNaN: true }),
          fc.double({ min: -1, max: 1, noNaN: true }),
        ),
        (b) => {
          fc.pre(Math.hypot(...b) > 1e-9 && new Set(b.map(Math.abs)).size === 3);
          const opposite = fieldDirection([-b[0], -b[1], -b[2]]);
          const here = fieldDirection(b);
          return (
            opposite.share === here.share && opposite.direction[1] === here.direction[1] && opposite.direction[0] !== here.direction[0]
          );
        },
      ),
    );
  });
});

describe('circulation and the right-hand rule', () => {
  it('an anticlockwise loop (seen from +z) has B along +z: out of the page', () => {
    // Common practice: right-hand grip rule for a loop (OpenStax University Physics Vol. 2, 12.4).
    expect(circulation(anticlockwise)).toBe('anticlockwise');
    const centre = loopField({ turns: 1, current: 1, radius: 1, point: [0, 0, 0] });
    expect(fieldDirection(centre)).toEqual({ direction: '+z', share: 1 });
    expect(fieldDirection(centre, { view: 'page' }).direction).toBe('out');
    const numerical = biotSavart({ path: anticlockwise, current: 1, point: [0.1, 0.2, 0], closed: true });
    expect(fieldDirection(numerical, { view: 'page' }).direction).toBe('out');
  });

  it('the same loop traversed the other way is clockwise and its field goes into the page', () => {
    const clockwise = [...anticlockwise].reverse();
    expect(circulation(clockwise)).toBe('clockwise');
    const b = biotSavart({ path: clockwise, current: 1, point: [0, 0, 0], closed: true });
    expect(fieldDirection(b, { view: 'page' }).direction).toBe('into');
  });

  it('a wire along +z seen at +x has B along +y (up the page)', () => {
    // Common practice: right-hand grip rule (thumb along the current, fingers along B).
    const b = biotSavart({
      path: [
        [0, 0, -5],
        [0, 0, 5],
      ],
      current: 1,
      point: [0.05, 0, 0],
    });
    expect(fieldDirection(b)).toEqual({ direction: '+y', share: 1 });
    expect(fieldDirection(b, { view: 'page' }).direction).toBe('up');
  });

  it('depends on the side it is seen from, and works for tilted loops', () => {
    expect(circulation(anticlockwise, [0, 0, -1])).toBe('clockwise');
    // A loop in the yz-plane going y → z is anticlockwise seen from +x (y × z = x).
    const yz = ring(8, (t) => [0.3, Math.cos(t), Math.sin(t)]);
    expect(circulation(yz, [1, 0, 0])).toBe('anticlockwise');
    expect(circulation(yz, [2, 0.5, 0])).toBe('anticlockwise');
    const b = biotSavart({ path: yz, current: 1, point: [0.3, 0, 0], closed: true });
    expect(fieldDirection(b).direction).toBe('+x');
  });

  it('agrees with the field at the centre for random star-shaped loops', () => {
    // Computed: for a loop star-shaped about the origin, every segment's B_z at the origin has the sign of its sense.
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0.2, max: 2, noNaN: true }), { minLength: 3, maxLength: 12 }),
        fc.boolean(),
        (radii, reverse) => {
          const loop = radii.map((r, i): Vec3 => [
            r * Math.cos((2 * Math.PI * i) / radii.length),
            r * Math.sin((2 * Math.PI * i) / radii.length),
            0,
          ]);
          const path = reverse ? loop.reverse() : loop;
          const sense = circulation(path);
          const b = biotSavart({ path, current: 2, point: [0, 0, 0], closed: true });
          return fieldDirection(b, { view: 'page' }).direction === (sense === 'anticlockwise' ? 'out' : 'into');
        },
      ),
    );
  });

  it('refuses a path with no area seen from the axis, too few points or a zero axis', () => {
    expect(() => circulation(anticlockwise, [1, 0, 0])).toThrow(/no area/);
    expect(() =>
      circulation([
        [0, 0, 0],
        [1, 0, 0],
      ]),
    ).toThrow(expect.objectContaining({ code: 'invalid-input' }));
    expect(() => circulation(anticlockwise, [0, 0, 0])).toThrow(/zero vector/);
    expect(() =>
      circulation([
        [0, 0, 0],
        [1, 0, 0],
        [2, 0, 0],
      ]),
    ).toThrow(/no area/);
  });
});
