import { describe, expect, it } from 'vitest';
import { drawVariables } from '../physics/units/draw-variables';
import { numeric } from './fixtures.test-support';
import { drawnValuesFor, sampleExpected, toNumericSpec } from './numeric-spec';

/** Rounds to n significant figures for comparison with a printed value. */
const sig = (x: number, n: number) => Number(x.toPrecision(n));

describe('toNumericSpec', () => {
  it('turns percent into a fraction and keeps the sig-fig rule, variables with their roles and distractors', () => {
    const spec = toNumericSpec(
      numeric({ relativeTolerancePercent: 5, absoluteTolerance: ' 0.5 uT ', sigFigs: { min: 2, max: 4, penalty: 0.5 } }),
    );
    expect(spec.tolerance).toEqual({ relative: 0.05, absolute: '0.5 uT' });
    expect(spec.sigFigs).toEqual({ min: 2, max: 4, penalty: 0.5 });
    expect(spec.requireUnit).toBe(true);
    expect(spec.variables).toEqual([
      { name: 'a', min: 4, max: 8, step: 0.5, unit: 'cm', role: 'radius' },
      { name: 'N', min: 10, max: 50, step: 10, role: 'turns' },
      { name: 'I', min: 0.5, max: 2, step: 0.1, unit: 'A' },
    ]);
    expect(spec.distractors).toEqual([
      { id: 'd1', formula: 'mu0*N*I/(2*pi*a)', feedback: 'That is the formula for a long straight wire.' },
    ]);
  });

  it('leaves tolerances out when none is set, so the engine default applies', () => {
    expect(toNumericSpec(numeric({ relativeTolerancePercent: null, absoluteTolerance: '' })).tolerance).toEqual({});
  });
});

describe('drawnValuesFor', () => {
  it('draws with the seed and the checkpoint key, so draws follow the key and not the version', () => {
    const checkpoint = numeric();
    const spec = toNumericSpec(checkpoint).variables ?? [];
    expect(drawnValuesFor(checkpoint, 'student-1')).toEqual(drawVariables(spec, 'student-1:numkey0001'));
    const edited = numeric({ prompt: 'Reworded in version 2: {{a}} {{N}} {{I}}', atMs: 99_000 });
    expect(drawnValuesFor(edited, 'student-1')).toEqual(drawnValuesFor(checkpoint, 'student-1'));
  });

  it('gives different students (and different checkpoints) their own values', () => {
    const seen = new Set(['s1', 's2', 's3', 's4', 's5', 's6'].map((s) => JSON.stringify(drawnValuesFor(numeric(), s))));
    expect(seen.size).toBeGreaterThan(1);
  });
});

describe('sampleExpected', () => {
  it('gives the centre field of a flat coil in the asked unit (NCERT Physics Part I, class XII, exercise 5.20(a))', () => {
    // NCERT 5.20(a): N = 30, r = 12 cm, I = 0.35 A gives B = 5.49e-5 T as printed (exact 5.498e-5; check 2 figures).
    const fixed = numeric({
      variables: [
        { name: 'a', min: 12, max: 12, step: 1, unit: 'cm', role: 'radius' },
        { name: 'N', min: 30, max: 30, step: 1, unit: '', role: 'turns' },
        { name: 'I', min: 0.35, max: 0.35, step: 0.01, unit: 'A', role: 'none' },
      ],
    });
    const sample = sampleExpected(fixed, 'any');
    expect(sample.problem).toBeNull();
    expect(sample.values).toEqual({ a: '12 cm', N: '30', I: '0.35 A' });
    const [number, unit] = (sample.expectedText ?? '').split(' ');
    expect(unit).toBe('µT');
    expect(sig(Number(number) * 1e-6, 2)).toBe(5.5e-5);
  });

  it('converts a fixed quantity to the asked unit (OpenStax University Physics Vol. 2, §12.2: 2 A at 1 cm gives 4e-5 T)', () => {
    const wire = numeric({
      expected: 'mu0*I/(2*pi*d)',
      variables: [
        { name: 'I', min: 2, max: 2, step: 1, unit: 'A', role: 'none' },
        { name: 'd', min: 0.01, max: 0.01, step: 0.01, unit: 'm', role: 'none' },
      ],
      distractors: [],
    });
    expect(sampleExpected({ ...wire, askedUnit: 'mT' }, 'x').expectedText).toBe('0.04 mT');
    expect(sampleExpected({ ...wire, askedUnit: 'T' }, 'x').expectedText).toBe('4e-5 T');
  });

  it('says when the formula gives another dimension than the asked unit', () => {
    expect(sampleExpected(numeric({ expected: '2*a', distractors: [] }), 's').problem).toBe(
      'The formula gives a length; the question asks for a magnetic field (T).',
    );
    expect(sampleExpected(numeric({ expected: '3 cm', askedUnit: '', distractors: [] }), 's').problem).toBe(
      'The expected answer is a length; the question asks for a plain number (no unit).',
    );
  });

  it('says when the formula does not evaluate or uses an undeclared variable', () => {
    expect(sampleExpected(numeric({ expected: 'mu0*N*I/(2*b)' }), 's').problem).toMatch(/uses b, which is not a declared variable/);
    expect(sampleExpected(numeric({ expected: 'mu0*N*I/(2*' }), 's').problem).toMatch(/cannot be read/);
    expect(sampleExpected(numeric({ expected: '' }), 's').problem).toMatch(/^Write the expected answer/);
    expect(sampleExpected(numeric({ askedUnit: 'furlong' }), 's').problem).toMatch(/^The asked unit cannot be read/);
  });

  it('reports a variable that cannot be drawn', () => {
    const bad = numeric({ variables: [{ name: 'a', min: 9, max: 2, step: 1, unit: 'cm', role: 'radius' }] });
    const sample = sampleExpected(bad, 's');
    expect(sample.expectedText).toBeNull();
    expect(sample.problem).toMatch(/smallest value \(9\) is larger than the largest \(2\)/);
  });
});
