import { describe, expect, it } from 'vitest';
import { StudentLessonViewSchema } from '../contracts/student-checkpoints';
import { allKinds, lesson, multipleChoice, numeric, prediction, sign } from './fixtures.test-support';
import { drawnValuesFor } from './numeric-spec';
import { toStudentView } from './student-view';

describe('toStudentView', () => {
  it('matches the student contract and lists checkpoints by time', () => {
    const content = lesson([...allKinds()].reverse());
    const view = toStudentView(content, { seed: 'student-1' });
    expect(StudentLessonViewSchema.parse(view)).toEqual(view);
    expect(view.checkpoints.map((c) => c.atMs)).toEqual([10_000, 20_000, 30_000, 40_000, 50_000, 70_000, 80_000]);
    expect(view.title).toBe('Field at the centre of a coil (demo)');
    expect(view.chapters.map((c) => c.title)).toEqual(['Set-up', 'Measurements']);
  });

  it('leaks no answer key', () => {
    const view = toStudentView(lesson(), { seed: 'student-1' });
    const text = JSON.stringify(view);
    for (const secret of [
      'SECRET-FEEDBACK-B',
      'Yes: the coil field points east',
      'mu0*N*I',
      'straight wire',
      'First hint',
      'right-hand rule',
      'Ampère’s law',
      'Biot Savart',
      'SECRET-REVEAL',
      'correctOptionId',
      '"correct"',
      '"feedback"',
      '"expected"',
      '"variables"',
      '"distractors"',
      '"hints"',
      '"explanation"',
      '"accepted"',
      '"answer"',
      '"revealText"',
      'relativeTolerancePercent',
    ]) {
      expect(text).not.toContain(secret);
    }
    expect(view.checkpoints.find((c) => c.kind === 'multiple-choice')).toMatchObject({ hintCount: 2 });
  });

  it("fills numeric prompts with this student's values and writes the unit as the engine does", () => {
    const view = toStudentView(lesson([numeric({ askedUnit: 'uT' })]), { seed: 'student-1' });
    const values = drawnValuesFor(numeric(), 'student-1');
    // A no-break space (U+00A0) between a value's number and its unit, so a narrow screen never wraps them apart.
    const kept = (value: number | string | undefined) => String(value).replace(' ', '\u00a0');
    const shown = view.checkpoints[0];
    expect(shown?.kind === 'numeric' && shown.prompt).toBe(
      `A coil of radius ${kept(values.a)} has ${kept(values.N)} turns and carries ${kept(values.I)}. Find the field at its centre.`,
    );
    expect(shown?.kind === 'numeric' && shown.values).toEqual({ a: kept(values.a), N: kept(values.N), I: kept(values.I) });
    expect(shown?.kind === 'numeric' && shown.askedUnit).toBe('µT');
  });

  it('writes drawn values with a decimal comma in a comma locale', () => {
    const half = numeric({ prompt: 'r = {{a}}', variables: [{ name: 'a', min: 4.5, max: 4.5, step: 0.5, unit: 'cm', role: 'radius' }] });
    const view = toStudentView(lesson([half]), { seed: 's', locale: 'de-DE' });
    expect(view.checkpoints[0]?.kind === 'numeric' && view.checkpoints[0].prompt).toBe('r = 4,5\u00a0cm');
    expect(view.checkpoints[0]?.kind === 'numeric' && view.checkpoints[0].values).toEqual({ a: '4,5\u00a0cm' });
  });

  it('shuffles options per student and per checkpoint key, deterministically, only when asked', () => {
    const order = (seed: string, shuffle = true) => {
      const c = toStudentView(lesson([multipleChoice({ shuffle })]), { seed }).checkpoints[0];
      return c?.kind === 'multiple-choice' ? c.options.map((o) => o.id).join('') : '';
    };
    expect(order('student-1')).toBe(order('student-1'));
    expect(order('student-1').split('').sort().join('')).toBe('abcd');
    const orders = new Set(['s1', 's2', 's3', 's4', 's5', 's6', 's7', 's8'].map((s) => order(s)));
    expect(orders.size).toBeGreaterThan(1);
    expect(order('s1', false)).toBe('abcd');
  });

  it("draws a derived sign question's set-up but not a set answer's, and offers the set's choices", () => {
    const derived = toStudentView(lesson([sign()]), { seed: 's' }).checkpoints[0];
    expect(derived?.kind === 'sign' && derived.figure?.conductor.shape).toBe('loop');
    expect(derived?.kind === 'sign' && derived.choices).toEqual(['into', 'out']);
    const set = toStudentView(lesson([sign({ answer: { source: 'set', choice: 'into' } })]), { seed: 's' }).checkpoints[0];
    expect(set?.kind === 'sign' && set.figure).toBeNull();
    expect(JSON.stringify(set)).not.toContain('source');
  });

  it('gives prediction options without the correct one, and none for a text prediction', () => {
    const choices = toStudentView(lesson([prediction()]), { seed: 's' }).checkpoints[0];
    expect(choices?.kind === 'prediction' && choices.options).toEqual([
      { id: 'p1', text: 'Turn further' },
      { id: 'p2', text: 'Turn back' },
    ]);
    const text = toStudentView(lesson([prediction({ response: { mode: 'text' } })]), { seed: 's' }).checkpoints[0];
    expect(text?.kind === 'prediction' && text.options).toBeNull();
  });
});
