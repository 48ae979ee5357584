import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { drawVariables } from '../units/draw-variables';
import { parseQuantity } from '../units/parse-quantity';
import type { VariableSpec, VariableValues } from '../units/types';
import { gradeNumeric } from './grade-numeric';
import type { NumericSpec } from './types';

// CODATA 2018 vacuum permeability, NIST "Fundamental Physical Constants — Extensive Listing".
const MU0 = 1.25663706212e-6;

const coilVariables: VariableSpec[] = [
  { name: 'N', min: 20, max: 60, step: 1, role: 'turns' },
  { name: 'I', min: 0.5, max: 2.5, step: 0.1, unit: 'A' },
  { name: 'a', min: 3, max: 9, step: 0.5, unit: 'cm', role: 'radius' },
];
// Field at the centre of a flat coil, B = mu0 N I / (2a): OpenStax University Physics Volume 2, 12.4 Magnetic
// Field of a Current Loop (B = mu0 I / 2R at the centre, times N for N turns).
const coil: NumericSpec = { expected: 'mu0*N*I/(2*a)', variables: coilVariables };
const values30: VariableValues = { N: 30, I: '2 A', a: '5 cm' };
const b30 = (MU0 * 30 * 2) / (2 * 0.05); // 7.5398e-4 T, worked by hand from the values above

const tesla = (v: number) => `${Number(v.toPrecision(4))} T`;
const field: NumericSpec = { expected: '62.8 uT' };

describe('mistake kinds (each re-works the expected value with one slip; issue 3)', () => {
  it.each([
    ['-63 µT', 'sign'],
    ['63 mT', 'prefix'], // ×1000 with a prefixed unit
    ['63 nT', 'prefix'], // ÷1000 with a prefixed unit
    ['0.063 T', 'power-of-ten'], // ×1000 but no prefix typed
    ['630 µT', 'power-of-ten'], // ×10: a prefix changes by 10^3, so this is not a prefix slip
    ['6.28e-9 T', 'power-of-ten'], // ÷10^4
    ['125.6 µT', 'factor-2'],
    ['31.4 µT', 'factor-2'],
    ['197.3 µT', 'factor-pi'],
    ['19.99 µT', 'factor-pi'],
    ['394.6 µT', 'factor-2pi'],
    ['9.995 µT', 'factor-2pi'],
  ])('%s for an expected 62.8 µT is a %s slip', (text, kind) => {
    const grade = gradeNumeric(field, text);
    expect(grade.mistake).toBe(kind);
    expect(grade).toMatchObject({ correct: false, score: 0 });
  });

  it('names the unit in prefix feedback and never states the expected value', () => {
    const grade = gradeNumeric(field, '63 mT');
    expect(grade.feedback).toBe('The digits look right. Check the prefix on your unit (mT).');
    expect(grade.feedback).not.toMatch(/62|6\.28/);
  });

  it('turns: the field of one turn (N → 1)', () => {
    const grade = gradeNumeric(coil, tesla(b30 / 30), { values: values30 });
    expect(grade.mistake).toBe('turns');
    expect(grade.feedback).toBe('It looks as if you worked out the field of a single turn. Check you used the number of turns (N).');
  });

  it('radius-diameter: a → 2a and a → a/2', () => {
    const diameter = gradeNumeric(coil, tesla(b30 / 2), { values: values30 });
    expect(diameter.mistake).toBe('radius-diameter');
    expect(diameter.feedback).toBe('Check the radius (a): it looks as if you used the diameter instead.');
    const halved = gradeNumeric(coil, tesla(b30 * 2), { values: values30 });
    expect(halved.mistake).toBe('radius-diameter');
    expect(halved.feedback).toBe('Check the radius (a): it looks as if you halved it.');
  });

  it('distractor: a teacher’s wrong formula with its own feedback', () => {
    const spec: NumericSpec = {
      ...coil,
      distractors: [{ id: 'wire', formula: 'mu0*I/(2*pi*a)', feedback: 'That is the field of a long straight wire.' }],
    };
    const wire = (MU0 * 2) / (2 * Math.PI * 0.05);
    const grade = gradeNumeric(spec, tesla(wire), { values: values30 });
    expect(grade.mistake).toBe('distractor:wire');
    expect(grade.feedback).toBe('That is the field of a long straight wire.');
  });

  it('reports no slip for an answer that matches none', () => {
    expect(gradeNumeric(field, '40 µT').mistake).toBeUndefined();
    expect(gradeNumeric(coil, tesla(b30 * 1.3), { values: values30 }).mistake).toBeUndefined();
  });

  it('does not report a slip of an expected zero', () => {
    expect(gradeNumeric({ expected: '0 T', tolerance: { absolute: '1 uT' } }, '5 mT').mistake).toBeUndefined();
  });
});

describe('tie order: distractor, sign, turns, radius-diameter, prefix, power-of-ten, factor (issue 3)', () => {
  it('distractor before sign', () => {
    const spec: NumericSpec = {
      ...coil,
      distractors: [{ id: 'minus', formula: '-mu0*N*I/(2*a)', feedback: 'Check the direction of the current.' }],
    };
    expect(gradeNumeric(spec, tesla(-b30), { values: values30 }).mistake).toBe('distractor:minus');
    expect(gradeNumeric(coil, tesla(-b30), { values: values30 }).mistake).toBe('sign');
  });

  it('distractor before radius-diameter and factor-2 (the same 2B)', () => {
    const spec: NumericSpec = { ...coil, distractors: [{ id: 'no-2', formula: 'mu0*N*I/a', feedback: 'Where does the 2 go?' }] };
    expect(gradeNumeric(spec, tesla(2 * b30), { values: values30 }).mistake).toBe('distractor:no-2');
  });

  it('turns before radius-diameter before factor-2 (N = 2: B/2 fits all three)', () => {
    const values: VariableValues = { N: 2, I: '2 A', a: '5 cm' };
    const b = (MU0 * 2 * 2) / (2 * 0.05);
    expect(gradeNumeric(coil, tesla(b / 2), { values }).mistake).toBe('turns');
    // With N = 30, B/2 fits radius-diameter and factor-2.
    expect(gradeNumeric(coil, tesla(b30 / 2), { values: values30 }).mistake).toBe('radius-diameter');
    // Without a radius role, the same answer is a factor-2 slip.
    const noRoles: NumericSpec = { expected: 'mu0*N*I/(2*a)' };
    expect(gradeNumeric(noRoles, tesla(b30 / 2), { values: values30 }).mistake).toBe('factor-2');
  });

  it('turns before power-of-ten (N = 10)', () => {
    const values: VariableValues = { N: 10, I: '2 A', a: '5 cm' };
    const b = (MU0 * 10 * 2) / (2 * 0.05);
    expect(gradeNumeric(coil, tesla(b / 10), { values }).mistake).toBe('turns');
    expect(gradeNumeric({ expected: 'mu0*N*I/(2*a)' }, tesla(b / 10), { values }).mistake).toBe('power-of-ten');
  });

  it('prefix before power-of-ten (63 mT fits both)', () => {
    expect(gradeNumeric(field, '63 mT').mistake).toBe('prefix');
    expect(gradeNumeric(field, '0.063 T').mistake).toBe('power-of-ten');
  });
});

describe('formula specs with per-student values from drawVariables', () => {
  const si = (v: number | string | undefined) => {
    if (typeof v === 'number') return v;
    const q = parseQuantity(String(v));
    if (!q.ok) throw new Error(`cannot read ${String(v)}`);
    return q.value;
  };

  it('grades each student against their own numbers', () => {
    const expectedValues = new Set<number>();
    for (let s = 0; s < 20; s++) {
      const values = drawVariables(coilVariables, `student-${s}`);
      // Independent method: the same formula worked in plain numbers from the SI values.
      const b = (MU0 * si(values.N) * si(values.I)) / (2 * si(values.a));
      expectedValues.add(b);
      const right = gradeNumeric(coil, `${Number((b * 1e6).toPrecision(3))} µT`, { values });
      expect(right.correct).toBe(true);
      expect(right.expected.value).toBeCloseTo(b, 15);
      expect(gradeNumeric(coil, tesla(b / 2), { values }).mistake).toBe('radius-diameter');
      expect(gradeNumeric(coil, tesla(b / si(values.N)), { values }).mistake).toBe('turns');
    }
    expect(expectedValues.size).toBeGreaterThan(10);
  });
});

describe('a correct answer is never labelled a mistake (property)', () => {
  it('holds for any values, prefixes, offsets inside the band and slip-like distractors', () => {
    const units: [string, number][] = [
      ['T', 1],
      ['mT', 1e-3],
      ['µT', 1e-6],
      ['G', 1e-4],
    ];
    const spec: NumericSpec = {
      ...coil,
      sigFigs: { min: 2, max: 6 },
      distractors: [
        { id: 'close', formula: 'mu0*N*I/(2*a)*1.005', feedback: 'close' },
        { id: 'no-2', formula: 'mu0*N*I/a', feedback: 'no 2' },
      ],
    };
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 60 }),
        fc.integer({ min: 5, max: 25 }),
        fc.integer({ min: 6, max: 18 }),
        fc.double({ min: -0.0199, max: 0.0199, noNaN: true }),
        fc.constantFrom(...units),
        (n, tenthsA, halfCm, offset, [unit, scale]) => {
          const values: VariableValues = { N: n, I: `${tenthsA / 10} A`, a: `${halfCm / 2} cm` };
          const b = (MU0 * n * (tenthsA / 10)) / (2 * (halfCm / 200));
          const text = `${Number(((b * (1 + offset)) / scale).toPrecision(6))} ${unit}`;
          const grade = gradeNumeric(spec, text, { values });
          expect(grade.withinTolerance).toBe(true);
          expect(grade.correct).toBe(true);
          expect(grade.mistake).toBeUndefined();
        },
      ),
    );
  });
});
