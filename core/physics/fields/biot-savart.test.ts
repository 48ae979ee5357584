import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MU0 } from '../constants';
import { add, cross, norm, scale, sub, type Vec3 } from '../vector';
import { biotSavart } from './biot-savart';

const vecRelative = (value: Readonly<Vec3>, reference: Readonly<Vec3>) => norm(sub(value, reference)) / norm(reference);

/** Independent method: midpoint-rule Biot–Savart, dB = (mu0 I / 4 pi) dl × r / r^3, on a very finely cut segment. */
function bruteForce(start: Vec3, end: Vec3, current: number, point: Vec3, pieces: number): Vec3 {
  const dl = scale(sub(end, start), 1 / pieces);
  let total: Vec3 = [0, 0, 0];
  for (let i = 0; i < pieces; i += 1) {
    const r = sub(point, add(start, scale(dl, i + 0.5)));
    total = add(total, scale(cross(dl, r), 1 / norm(r) ** 3));
  }
  return scale(total, (MU0 * current) / (4 * Math.PI));
}

describe('biotSavart', () => {
  it('gives the exact finite-segment field: agrees with a fine midpoint sum at random points', () => {
    // Independent method: direct numerical integration of the Biot–Savart law (midpoint rule, 20000 pieces).
    const coordinate = fc.double({ min: -1, max: 1, noNaN: true });
    const vec = fc.tuple(coordinate, coordinate, coordinate);
    fc.assert(
      fc.property(vec, vec, vec, (start, end, point) => {
        fc.pre(norm(sub(end, start)) > 0.1);
        // Stay a fair distance from the segment so the midpoint rule is accurate.
        const u = scale(sub(end, start), 1 / norm(sub(end, start)));
        const distance = norm(cross(u, sub(point, start)));
        fc.pre(distance > 0.2);
        const exact = biotSavart({ path: [start, end], current: 1.7, point });
        expect(vecRelative(exact, bruteForce(start, end, 1.7, point, 20000))).toBeLessThan(1e-7);
      }),
      { numRuns: 20 },
    );
  });

  it('gives mu0 I / (4 pi d) (cos θ1 − cos θ2) on the perpendicular bisector of a segment', () => {
    // OpenStax University Physics Vol. 2, 12.2: B = (mu0 I / 4 pi R)(sin θ2 − sin θ1) for a finite straight wire.
    const [half, d, current] = [0.3, 0.4, 5];
    const b = biotSavart({
      path: [
        [0, 0, -half],
        [0, 0, half],
      ],
      current,
      point: [d, 0, 0],
    });
    const expected = ((MU0 * current) / (4 * Math.PI * d)) * ((2 * half) / Math.hypot(half, d));
    expect(b[0]).toBe(0);
    expect(b[2]).toBe(0);
    expect(Math.abs(b[1] - expected) / expected).toBeLessThan(1e-14);
  });

  it('follows the right-hand rule: a current along +z seen at +x gives B along +y', () => {
    // Common practice: right-hand grip rule (OpenStax University Physics Vol. 2, 12.2, Figure "right-hand rule 2").
    const b = biotSavart({
      path: [
        [0, 0, -10],
        [0, 0, 10],
      ],
      current: 1,
      point: [0.1, 0, 0],
    });
    expect(b[1]).toBeGreaterThan(0);
    expect(Math.abs(b[0]) + Math.abs(b[2])).toBe(0);
    const reversed = biotSavart({
      path: [
        [0, 0, 10],
        [0, 0, -10],
      ],
      current: 1,
      point: [0.1, 0, 0],
    });
    expect(reversed[1]).toBeCloseTo(-b[1], 20);
  });

  it('gives 2 sqrt(2) mu0 I / (pi s) at the centre of a square loop, and joins the last point when closed', () => {
    // Standard result for a square loop of side s at its centre (four finite wires; from memory), computed from 12.2.
    const s = 0.2;
    const square: Vec3[] = [
      [-s / 2, -s / 2, 0],
      [s / 2, -s / 2, 0],
      [s / 2, s / 2, 0],
      [-s / 2, s / 2, 0],
    ];
    const b = biotSavart({ path: square, current: 3, point: [0, 0, 0], closed: true });
    const expected = (2 * Math.SQRT2 * MU0 * 3) / (Math.PI * s);
    expect(Math.abs(b[2] - expected) / expected).toBeLessThan(1e-14);
    // Open, the fourth side is missing: three quarters of the field.
    const open = biotSavart({ path: square, current: 3, point: [0, 0, 0] });
    expect(Math.abs(open[2] - 0.75 * expected) / expected).toBeLessThan(1e-14);
    // A repeated closing point is a zero-length segment and changes nothing.
    const repeated = biotSavart({ path: [...square, square[0] as Vec3], current: 3, point: [0, 0, 0], closed: true });
    expect(Math.abs(repeated[2] - b[2]) / expected).toBeLessThan(1e-15);
  });

  it('keeps full precision for a long wire seen from close by, and gives zero on its line beyond the ends', () => {
    // OpenStax University Physics Vol. 2, 12.2: long wire mu0 I / (2 pi R); computed: a point on the line of a segment gets no field.
    const b = biotSavart({
      path: [
        [0, 0, -1e4],
        [0, 0, 1e4],
      ],
      current: 2,
      point: [0, 1e-3, 0],
    });
    expect(Math.abs(-b[0] - (MU0 * 2) / (2 * Math.PI * 1e-3)) / 4e-4).toBeLessThan(1e-12);
    expect(
      biotSavart({
        path: [
          [0, 0, 0],
          [0, 0, 1],
        ],
        current: 2,
        point: [0, 0, 3],
      }),
    ).toEqual([0, 0, 0]);
  });

  it('throws on-conductor on a segment, at a vertex, and invalid-input for a bad path', () => {
    const path: Vec3[] = [
      [0, 0, 0],
      [1, 0, 0],
      [1, 1, 0],
    ];
    expect(() => biotSavart({ path, current: 1, point: [0.5, 0, 0] })).toThrow(expect.objectContaining({ code: 'on-conductor' }));
    expect(() => biotSavart({ path, current: 1, point: [1, 1, 0] })).toThrow(expect.objectContaining({ code: 'on-conductor' }));
    expect(() => biotSavart({ path, current: 1, point: [0.5, 0.5, 0], closed: true })).toThrow(/segment 3/);
    expect(() => biotSavart({ path: [[0, 0, 0]], current: 1, point: [1, 1, 1] })).toThrow(
      expect.objectContaining({ code: 'invalid-input' }),
    );
    expect(() =>
      biotSavart({
        path: [
          [0, 0, 0],
          [0, Number.NaN, 0],
        ],
        current: 1,
        point: [1, 1, 1],
      }),
    ).toThrow(/path\[1\]/);
    expect(() => biotSavart({ path, current: Infinity, point: [1, 1, 1] })).toThrow(/current/);
  });
});
