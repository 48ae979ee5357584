import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { itemAnalysis, pearson, type ScoredResponse } from './item-analysis';

// Independent method: the textbook "computational" Pearson formula in one pass of raw sums,
// r = (n Σxy − Σx Σy) / sqrt((n Σx² − (Σx)²)(n Σy² − (Σy)²)), a different route from the two-pass code.
function rawSumPearson(xs: number[], ys: number[]): number {
  const n = xs.length;
  let sx = 0;
  let sy = 0;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    sx += xs[i]!;
    sy += ys[i]!;
    sxy += xs[i]! * ys[i]!;
    sxx += xs[i]! * xs[i]!;
    syy += ys[i]! * ys[i]!;
  }
  return (n * sxy - sx * sy) / Math.sqrt((n * sxx - sx * sx) * (n * syy - sy * sy));
}

// Independent method: the point-biserial formula r = (M1 − M0) / s · sqrt(p q) for a 0/1 item, with s the
// population standard deviation of the rest scores (classical test theory, common practice).
function pointBiserial(item: number[], rest: number[]): number {
  const n = item.length;
  const ones = rest.filter((_, i) => item[i] === 1);
  const zeros = rest.filter((_, i) => item[i] === 0);
  const mean = (a: number[]) => a.reduce((s, v) => s + v, 0) / a.length;
  const m = mean(rest);
  const s = Math.sqrt(rest.reduce((acc, v) => acc + (v - m) ** 2, 0) / n);
  const p = ones.length / n;
  return ((mean(ones) - mean(zeros)) / s) * Math.sqrt(p * (1 - p));
}

const r = (studentId: string, itemId: string, score: number, choice?: string): ScoredResponse =>
  choice === undefined ? { studentId, itemId, score } : { studentId, itemId, score, choice };

// Hand-computed set: four students, items A, B, C scored 0/1, item D answered correctly by everyone.
const HAND: ScoredResponse[] = [
  r('s1', 'A', 1),
  r('s1', 'B', 1, 'a'),
  r('s1', 'C', 1),
  r('s1', 'D', 1),
  r('s2', 'A', 1),
  r('s2', 'B', 0, 'b'),
  r('s2', 'C', 1),
  r('s2', 'D', 1),
  r('s3', 'A', 0),
  r('s3', 'B', 1, 'a'),
  r('s3', 'C', 0),
  r('s3', 'D', 1),
  r('s4', 'A', 0),
  r('s4', 'B', 0, 'c'),
  r('s4', 'C', 0),
  r('s4', 'D', 1),
];

describe('itemAnalysis on a hand-computed set (classical test theory, common practice)', () => {
  const result = itemAnalysis(HAND);

  it('gives the proportion correct as difficulty', () => {
    // By hand: A, B, C answered correctly by 2 of 4; D by 4 of 4.
    expect(result.difficulty).toEqual({ A: 0.5, B: 0.5, C: 0.5, D: 1 });
  });

  it('correlates each item with the rest score', () => {
    // By hand, item A: scores 1,1,0,0; rest (B+C+D) 3,2,2,1; Σdxdy = 1, Σdx² = 1, Σdy² = 2 → r = 1/√2.
    expect(result.discrimination.A).toBeCloseTo(Math.SQRT1_2, 12);
    // Item B: scores 1,0,1,0; rest 3,3,1,1 → Σdxdy = 0 → r = 0.
    expect(result.discrimination.B).toBeCloseTo(0, 12);
    expect(result.discrimination.C).toBeCloseTo(Math.SQRT1_2, 12);
    // Item D has no variance: discrimination undefined.
    expect(result.discrimination.D).toBeNull();
  });

  it('agrees with the point-biserial formula (independent method)', () => {
    expect(result.discrimination.A).toBeCloseTo(pointBiserial([1, 1, 0, 0], [3, 2, 2, 1]), 12);
  });

  it('counts choices per item and lists items sorted', () => {
    expect(result.distractors.B).toEqual({ a: 2, b: 1, c: 1 });
    expect(result.distractors.A).toEqual({});
    expect(result.items.map((i) => i.itemId)).toEqual(['A', 'B', 'C', 'D']);
    expect(result.items[0]).toEqual({
      itemId: 'A',
      responses: 4,
      difficulty: 0.5,
      discrimination: result.discrimination.A,
      distractors: {},
    });
  });

  it('uses the last response of a student who answered twice', () => {
    const again = itemAnalysis([...HAND, r('s4', 'A', 1)]);
    expect(again.difficulty.A).toBe(0.75);
    expect(again.items[0]!.responses).toBe(4);
  });

  it('returns null discrimination with a single student, and an empty analysis for no responses', () => {
    expect(itemAnalysis([r('s1', 'A', 1), r('s1', 'B', 0)]).discrimination).toEqual({ A: null, B: null });
    expect(itemAnalysis([])).toEqual({ difficulty: {}, discrimination: {}, distractors: {}, items: [] });
  });

  it('refuses scores outside 0..1 and missing ids with a specific message', () => {
    expect(() => itemAnalysis([r('s1', 'A', 1.5)])).toThrow('Response 1 (item A) has score 1.5; a score must be from 0 to 1.');
    expect(() => itemAnalysis([r('s1', 'A', Number.NaN)])).toThrow('has score NaN');
    expect(() => itemAnalysis([r('', 'A', 1)])).toThrow('Response 1 has no student id.');
  });
});

describe('pearson', () => {
  it('matches the raw-sum formula on random partial-credit data (independent method)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 10, noNaN: true })), {
          minLength: 3,
          maxLength: 40,
        }),
        (pairs) => {
          const xs = pairs.map((p) => p[0]);
          const ys = pairs.map((p) => p[1]);
          const mine = pearson(xs, ys);
          const other = rawSumPearson(xs, ys);
          if (mine === null) return; // no variance: the raw formula divides by ~0
          if (!Number.isFinite(other)) return;
          expect(mine).toBeGreaterThanOrEqual(-1);
          expect(mine).toBeLessThanOrEqual(1);
          // The raw-sum formula loses digits to cancellation; agreement to 1e-6 is what it can offer.
          expect(Math.abs(mine - other)).toBeLessThan(1e-6);
        },
      ),
    );
  });

  it('gives +1 and −1 for exact linear relations and null for a constant series', () => {
    expect(pearson([0, 1, 2], [1, 3, 5])).toBeCloseTo(1, 12);
    expect(pearson([0, 1, 2], [5, 3, 1])).toBeCloseTo(-1, 12);
    expect(pearson([1, 1, 1], [1, 2, 3])).toBeNull();
  });

  it('agrees with itemAnalysis on random data (rest score computed separately in the test)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.array(fc.integer({ min: 0, max: 4 }), { minLength: 3, maxLength: 3 }), { minLength: 2, maxLength: 12 }),
        (rows) => {
          const responses = rows.flatMap((row, s) => row.map((v, i) => r(`s${s}`, `i${i}`, v / 4)));
          const result = itemAnalysis(responses);
          const item0 = rows.map((row) => row[0]! / 4);
          const rest0 = rows.map((row) => (row[1]! + row[2]!) / 4);
          const expected = pearson(item0, rest0);
          if (expected === null) expect(result.discrimination.i0).toBeNull();
          else expect(result.discrimination.i0).toBeCloseTo(rawSumPearson(item0, rest0), 6);
        },
      ),
    );
  });
});
