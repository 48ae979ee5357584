import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { describeDimension } from '../units/dimensions';
import { GradingSetupError, numericSpecProblem } from './compile-spec';
import { gradeNumeric } from './grade-numeric';
import type { NumericSpec } from './types';

const field: NumericSpec = { expected: '62.8 uT' };

describe('gradeNumeric: accepted forms of a correct answer', () => {
  it.each([
    '63 µT', // U+00B5 micro sign
    '63 μT', // U+03BC Greek mu
    '63 uT',
    '6.3e-5 T',
    '6.3E-5T',
    '6.3 × 10^-5 T',
    '0.063 mT',
    '0.63 G', // 1 G = 1e-4 T: BIPM SI Brochure 8th edition (2006), Table 9
    '630 mG',
    '  62.8 µT  ',
  ])('accepts %s for 62.8 µT at the default 2 percent (common practice)', (text) => {
    const grade = gradeNumeric(field, text);
    expect(grade.correct).toBe(true);
    expect(grade.score).toBe(1);
    expect(grade.mistake).toBeUndefined();
    expect(grade.error).toBeUndefined();
    expect(grade.feedback).toBe('Correct.');
  });

  it('reports the expected value in SI and the relative error', () => {
    const grade = gradeNumeric(field, '63 µT');
    // 1 µT = 1e-6 T: BIPM SI Brochure, 9th edition (2019), prefixes.
    expect(grade.expected.value).toBeCloseTo(62.8e-6, 18);
    expect(grade.expected.unit).toBe('T');
    expect(describeDimension(grade.expected.dimension).unitName).toBe('tesla');
    expect(grade.relativeError).toBeCloseTo(0.2 / 62.8, 12);
    expect(grade.parsed?.unit).toBe('µT');
  });

  it('reads a decimal comma in a comma locale', () => {
    expect(gradeNumeric(field, '0,063 mT', { locale: 'fr-FR' }).correct).toBe(true);
  });

  it('rejects an answer outside 2 % with a kind, general message', () => {
    const grade = gradeNumeric(field, '66 µT');
    expect(grade).toMatchObject({
      correct: false,
      score: 0,
      withinTolerance: false,
      feedback: 'Not quite. Check your working and try again.',
    });
    expect(grade.mistake).toBeUndefined();
  });
});

describe('gradeNumeric: error codes', () => {
  it('empty', () => {
    for (const text of ['', '   ']) {
      const grade = gradeNumeric(field, text);
      expect(grade.error).toEqual({ code: 'empty', message: 'Type your answer as a number with its unit.' });
      expect(grade).toMatchObject({ correct: false, score: 0, parsed: null, relativeError: null });
    }
  });

  it('not-a-number', () => {
    const grade = gradeNumeric(field, 'sixty T');
    expect(grade.error?.code).toBe('not-a-number');
    expect(grade.error?.message.length).toBeGreaterThan(10);
    expect(grade.feedback).toBe(grade.error?.message);
  });

  it('unknown-unit, with the tesla hint for a lowercase t', () => {
    expect(gradeNumeric(field, '63 furlongs').error?.code).toBe('unknown-unit');
    const t = gradeNumeric(field, '63 ut');
    expect(t.error?.code).toBe('unknown-unit');
    expect(t.error?.message).toContain('did you mean µT');
  });

  it('wrong-dimension, in words a 15-year-old understands (issue 3 wording)', () => {
    const grade = gradeNumeric(field, '63 m');
    expect(grade.error).toEqual({
      code: 'wrong-dimension',
      message: '63 m is a length; this question asks for a magnetic field, in tesla.',
    });
    expect(grade.parsed?.dimension).toBe('length');
    expect(gradeNumeric(field, '2 A').error?.message).toBe(
      '2 A is an electric current; this question asks for a magnetic field, in tesla.',
    );
    expect(gradeNumeric({ expected: '30' }, '30 T').error?.message).toBe(
      '30 T is a magnetic field; this question asks for a plain number, with no unit.',
    );
  });

  it('missing-unit by default, and a bare number read in the expected unit when no unit is required', () => {
    expect(gradeNumeric(field, '63').error).toEqual({
      code: 'missing-unit',
      message: 'Add a unit: this question asks for a magnetic field, in tesla (T).',
    });
    const free = gradeNumeric({ expected: '62.8 uT', requireUnit: false }, '63');
    expect(free.correct).toBe(true);
    expect(free.parsed?.value).toBeCloseTo(63e-6, 18);
    expect(gradeNumeric({ expected: '62.8 uT', requireUnit: false }, '6.3e-5').correct).toBe(false);
    // A count needs no unit at all.
    expect(gradeNumeric({ expected: '30' }, '30').correct).toBe(true);
  });
});

describe('gradeNumeric: significant figures', () => {
  const rounded: NumericSpec = { expected: '0.01049 T', sigFigs: { min: 2, max: 3 } };

  it('counts 0.010 T correctly rounded at two figures as within tolerance (issue 3 example)', () => {
    const grade = gradeNumeric(rounded, '0.010 T');
    expect(grade).toMatchObject({ correct: true, score: 1, withinTolerance: true, roundedTo: 2 });
    expect(grade.feedback).toBe('Correct, rounded to 2 significant figures.');
    expect(grade.relativeError).toBeGreaterThan(0.02);
    expect(gradeNumeric(rounded, '10 mT').correct).toBe(true);
    // Without the rule the same answer is 4.7 % off and wrong.
    expect(gradeNumeric({ expected: '0.01049 T' }, '0.010 T').correct).toBe(false);
  });

  it('gives feedback only, full score, for too many figures by default (common practice)', () => {
    const grade = gradeNumeric(rounded, '0.010490 T');
    expect(grade).toMatchObject({ correct: false, score: 1, withinTolerance: true, mistake: 'sig-figs' });
    expect(grade.feedback).toBe('Right value. Now give it to 2 or 3 significant figures.');
  });

  it('applies a penalty when the teacher sets one', () => {
    const spec: NumericSpec = { ...rounded, sigFigs: { min: 2, max: 3, penalty: 0.25 } };
    expect(gradeNumeric(spec, '0.0104900 T')).toMatchObject({ mistake: 'sig-figs', score: 0.75, correct: false });
    // 0.01 has one significant figure (OpenStax University Physics Volume 1, 1.6): below the minimum, so the
    // rounding allowance does not apply and 0.01 T is simply 4.7 % off.
    expect(gradeNumeric(spec, '0.01 T')).toMatchObject({ score: 0, correct: false, withinTolerance: false });
  });

  it('lets trailing zeros without a point count under either reading', () => {
    // '6300' may have 2 to 4 figures (OpenStax University Physics Volume 1, 1.6).
    const spec: NumericSpec = { expected: '6283 uT', sigFigs: { min: 3, max: 3 } };
    expect(gradeNumeric(spec, '6300 µT').correct).toBe(true);
    expect(gradeNumeric(spec, '6280 µT').correct).toBe(true);
    expect(gradeNumeric(spec, '6283 µT').mistake).toBe('sig-figs');
  });
});

describe('gradeNumeric: tolerance', () => {
  it('uses an absolute tolerance alone when only that is given', () => {
    const spec: NumericSpec = { expected: '40 uT', tolerance: { absolute: '1 uT' } };
    expect(gradeNumeric(spec, '41 µT').correct).toBe(true);
    expect(gradeNumeric(spec, '39 µT').correct).toBe(true);
    expect(gradeNumeric(spec, '41.2 µT').correct).toBe(false);
    expect(gradeNumeric(spec, '38.8 µT').correct).toBe(false);
  });

  it('grades answers at expected·(1 ± r·t) alike (property: tolerance symmetry, common practice)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 999, noNaN: true }),
        fc.double({ min: 0.005, max: 0.1, noNaN: true }),
        fc.double({ min: 0, max: 0.99, noNaN: true }),
        fc.double({ min: 1.01, max: 1.5, noNaN: true }),
        (microtesla, r, inside, outside) => {
          const spec: NumericSpec = { expected: `${microtesla} uT`, tolerance: { relative: r } };
          const e = microtesla * 1e-6;
          const up = gradeNumeric(spec, `${e * (1 + r * inside)} T`);
          const down = gradeNumeric(spec, `${e * (1 - r * inside)} T`);
          expect(up.correct).toBe(true);
          expect(down.correct).toBe(true);
          expect(gradeNumeric(spec, `${e * (1 + r * outside)} T`).withinTolerance).toBe(false);
          expect(gradeNumeric(spec, `${e * (1 - r * outside)} T`).withinTolerance).toBe(false);
        },
      ),
    );
  });

  it('grades answers at expected ± a·t alike under an absolute tolerance (property, common practice)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 10, max: 500 }), fc.double({ min: 0, max: 0.99, noNaN: true }), (microtesla, t) => {
        const spec: NumericSpec = { expected: `${microtesla} uT`, tolerance: { absolute: '2 uT' } };
        const plus = gradeNumeric(spec, `${microtesla + 2 * t} µT`);
        const minus = gradeNumeric(spec, `${microtesla - 2 * t} µT`);
        expect(plus.correct).toBe(true);
        expect(minus.correct).toBe(true);
        expect(gradeNumeric(spec, `${microtesla + 2.05} µT`).correct).toBe(gradeNumeric(spec, `${microtesla - 2.05} µT`).correct);
      }),
    );
  });
});

describe('gradeNumeric: spec problems are the caller’s, not the student’s', () => {
  it('throws GradingSetupError with a message, and numericSpecProblem reports it before saving', () => {
    const bad: NumericSpec = { expected: 'mu0*N*(', variables: [] };
    expect(() => gradeNumeric(bad, '1 T')).toThrow(GradingSetupError);
    expect(numericSpecProblem(bad)).toMatch(/^The expected formula "mu0\*N\*\(" cannot be used: /);
    expect(numericSpecProblem({ expected: '1 T', tolerance: { relative: 2 } })).toBe(
      'A relative tolerance must be from 0 to less than 1 (0.02 is 2 %); got 2.',
    );
    expect(numericSpecProblem({ expected: '1 T', tolerance: { absolute: '1 m' } })).toBe(
      'The absolute tolerance "1 m" is a length, but the answer is a magnetic field.',
    );
    expect(numericSpecProblem(field)).toBeNull();
  });

  it('throws missing-values for a formula without the student’s values', () => {
    const spec: NumericSpec = { expected: 'mu0*N*I/(2*a)' };
    let caught: unknown;
    try {
      gradeNumeric(spec, '1 T');
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(GradingSetupError);
    expect((caught as GradingSetupError).code).toBe('missing-values');
    expect((caught as GradingSetupError).message).toBe('The expected formula needs values for I, N, a.');
  });
});
