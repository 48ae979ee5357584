import { describe, expect, it } from 'vitest';
import type { Checkpoint } from '../contracts/checkpoints';
import { allKinds, equation, lesson, multipleChoice, note, numeric, prediction, shortText, sign } from './fixtures.test-support';
import { lessonProblems } from './lesson-problems';

const context = { durationMs: 90_000, frameRate: 25 };
const problemsOf = (checkpoints: Checkpoint[], over = {}) => lessonProblems(lesson(checkpoints, over), context);
const at = (checkpoints: Checkpoint[], path: string) =>
  problemsOf(checkpoints)
    .filter((p) => p.path === path)
    .map((p) => p.message);

describe('lessonProblems: a ready lesson', () => {
  it('finds nothing wrong with a complete lesson of every kind', () => {
    expect(lessonProblems(lesson(), context)).toEqual([]);
  });
});

describe('lessonProblems: the timeline', () => {
  it('names the checkpoint a pin is too close to, with both times', () => {
    const close = [multipleChoice({ atMs: 62_500, label: 'Needle' }), shortText({ atMs: 62_700 })];
    expect(at(close, 'checkpoints.1.atMs')).toEqual([
      'This checkpoint (1:02.7) is only 0.2 s after “Needle” (1:02.5); keep at least 0.5 s between checkpoints.',
    ]);
  });

  it('calls two pins in one frame the same moment', () => {
    const same = [multipleChoice({ atMs: 5_000, label: 'First' }), note({ atMs: 5_020 })];
    expect(at(same, 'checkpoints.1.atMs')).toEqual(['This checkpoint is at the same moment (0:05.0) as “First”: move one of them.']);
    expect(at([multipleChoice({ atMs: 5_000 }), note({ atMs: 5_000 })], 'checkpoints.1.atMs')[0]).toMatch(/same moment/);
  });

  it('uses the lesson spacing setting', () => {
    const pins = [multipleChoice({ atMs: 10_000 }), note({ atMs: 11_000 })];
    expect(lessonProblems(lesson(pins), context)).toEqual([]);
    const wide = lesson(pins);
    wide.settings.minSpacingMs = 2_000;
    expect(lessonProblems(wide, context).map((p) => p.path)).toEqual(['checkpoints.1.atMs']);
  });

  it('refuses pins past the end of the recording, and skips that check when the length is unknown', () => {
    expect(at([note({ atMs: 95_000 })], 'checkpoints.0.atMs')).toEqual([
      'This checkpoint is at 1:35.0, after the end of the recording (1:30.0).',
    ]);
    expect(lessonProblems(lesson([note({ atMs: 95_000 })], { chapters: [] }), { durationMs: Number.NaN })).toEqual([]);
  });

  it("puts a prediction's reveal after its pin and inside the recording", () => {
    expect(at([prediction({ atMs: 50_000, revealAtMs: 50_000 })], 'checkpoints.0.revealAtMs')).toEqual([
      'The reveal (0:50.0) must come after the prediction itself (0:50.0).',
    ]);
    expect(at([prediction({ revealAtMs: 91_000 })], 'checkpoints.0.revealAtMs')[0]).toMatch(/after the end of the recording \(1:30\.0\)/);
  });

  it('refuses duplicate checkpoint keys', () => {
    expect(at([note(), note({ atMs: 85_000 })], 'checkpoints.1.key')).toEqual([
      'This checkpoint has the same key as checkpoint 1; each needs its own key.',
    ]);
  });
});

describe('lessonProblems: chapters', () => {
  const withChapters = (chapters: ReturnType<typeof lesson>['chapters']) => lessonProblems(lesson([], { chapters }), context);

  it('needs a title, a start before the end, and an end inside the recording', () => {
    expect(
      withChapters([
        { key: 'chapter001', title: ' ', startMs: 0, endMs: 10_000 },
        { key: 'chapter002', title: 'Back', startMs: 20_000, endMs: 15_000 },
        { key: 'chapter003', title: 'Late', startMs: 30_000, endMs: 95_000 },
      ]),
    ).toEqual([
      { path: 'chapters.0.title', message: 'Give chapter 1 a title.' },
      { path: 'chapters.1.endMs', message: 'The chapter ends (0:15.0) before or when it starts (0:20.0).' },
      { path: 'chapters.2.endMs', message: 'The chapter ends at 1:35.0, after the end of the recording (1:30.0).' },
    ]);
  });

  it('refuses overlapping chapters, naming both', () => {
    expect(
      withChapters([
        { key: 'chapter002', title: 'Second', startMs: 25_000, endMs: 40_000 },
        { key: 'chapter001', title: 'First', startMs: 0, endMs: 30_000 },
      ]),
    ).toEqual([
      { path: 'chapters.0.startMs', message: '“Second” starts at 0:25.0, before “First” ends (0:30.0): chapters may not overlap.' },
    ]);
  });
});

describe('lessonProblems: each kind', () => {
  it('needs prompts for answered kinds and a body for notes', () => {
    expect(at([shortText({ prompt: ' ' })], 'checkpoints.0.prompt')).toEqual(['Write the question.']);
    expect(at([note({ body: '' })], 'checkpoints.0.body')).toEqual(['Write the safety caution.']);
  });

  it('checks multiple-choice options', () => {
    expect(at([multipleChoice({ options: [{ id: 'a', text: 'Only', correct: true, feedback: '' }] })], 'checkpoints.0.options')).toEqual([
      'Give at least two options.',
    ]);
    const none = multipleChoice({ options: multipleChoice().options.map((o) => ({ ...o, correct: false })) });
    expect(at([none], 'checkpoints.0.options')).toEqual(['Mark the correct option.']);
    const two = multipleChoice({ options: multipleChoice().options.map((o, j) => ({ ...o, correct: j < 2 })) });
    expect(at([two], 'checkpoints.0.options')).toEqual(['2 options are marked correct: mark one, or allow several correct options.']);
    expect(at([{ ...two, allowSeveral: true }], 'checkpoints.0.options')).toEqual([]);
    const blank = multipleChoice({
      options: multipleChoice().options.map((o, j) => ({ ...o, text: j === 1 ? '' : o.text, id: j === 3 ? 'a' : o.id })),
    });
    expect(at([blank], 'checkpoints.0.options.1.text')).toEqual(['Write this option, or remove it.']);
    expect(at([blank], 'checkpoints.0.options.3.id')).toEqual(['Two options share the id a.']);
  });

  it('checks numeric placeholders, variables, units, tolerances and distractors', () => {
    const p = (over: Parameters<typeof numeric>[0]) => problemsOf([numeric(over)]);
    expect(p({ prompt: 'Radius {{a}} and {{b}}' }).map((x) => x.message)).toEqual([
      '{{b}} is not a declared variable (declared: a, N, I).',
    ]);
    expect(p({ variables: [], expected: '62.8 uT', prompt: 'r = {{a}}' })[0]?.message).toBe(
      '{{a}} is not a declared variable (no variables are declared yet).',
    );
    expect(
      p({ variables: [{ name: 'a', min: 8, max: 4, step: 1, unit: 'cm', role: 'radius' }, ...numeric().variables.slice(1)] }),
    ).toContainEqual({
      path: 'checkpoints.0.variables.0.max',
      message: 'The largest value (4) is smaller than the smallest (8).',
    });
    expect(p({ expected: '2*a', distractors: [] })).toEqual([
      { path: 'checkpoints.0.expected', message: 'The formula gives a length; the question asks for a magnetic field (T).' },
    ]);
    expect(p({ expected: 'mu0*N*I/(2*r)' })).toEqual([
      { path: 'checkpoints.0.expected', message: 'The expected formula uses r, which is not a declared variable (declared: a, N, I).' },
    ]);
    expect(p({ askedUnit: 'uTT' })[0]?.path).toBe('checkpoints.0.askedUnit');
    expect(p({ absoluteTolerance: '1 cm' })).toEqual([
      { path: 'checkpoints.0.absoluteTolerance', message: 'The absolute tolerance is a length, but the answer is a magnetic field.' },
    ]);
    expect(p({ distractors: [{ id: 'd1', formula: 'N*a', feedback: '' }] })).toEqual([
      {
        path: 'checkpoints.0.distractors.0.formula',
        message: 'This formula gives a length, but the answer is a magnetic field: no answer could match it.',
      },
    ]);
    expect(p({ distractors: [{ id: 'd1', formula: 'mu0*(', feedback: '' }] })[0]?.message).toMatch(
      /^This formula cannot be used: The formula cannot be read/,
    );
    expect(p({ relativeTolerancePercent: 100 })[0]?.message).toBe('A relative tolerance must be below 100 %.');
  });

  it('checks short answers, signs and predictions', () => {
    expect(at([shortText({ accepted: ['', ' '] })], 'checkpoints.0.accepted')).toEqual(['Add at least one accepted answer.']);
    expect(at([sign({ choiceSet: 'axis', answer: { source: 'set', choice: 'into' } })], 'checkpoints.0.answer.choice')[0]).toMatch(
      /^Choose the correct answer from this set: \+x direction/,
    );
    // A point on the loop's own wire has no finite field in the thin-wire model, so no answer can be derived there.
    const onWire = sign({ answer: { source: 'geometry', geometry: { ...geometryOf(sign()), point: [0.05, 0, 0] } } });
    expect(at([onWire], 'checkpoints.0.answer.geometry')[0]).toMatch(/^The field point is on the conductor/);
    const unsure = prediction({
      scored: true,
      response: {
        mode: 'choices',
        options: [
          { id: 'p1', text: 'a' },
          { id: 'p2', text: 'b' },
        ],
        correctOptionId: null,
      },
    });
    expect(at([unsure], 'checkpoints.0.response.correctOptionId')).toEqual([
      'A scored prediction needs its correct choice: pick it, or turn scoring off.',
    ]);
    expect(at([prediction({ scored: true, response: { mode: 'text' } })], 'checkpoints.0.scored')[0]).toMatch(
      /^Only a prediction with choices/,
    );
  });

  it('checks LaTeX, the live model and Markdown in every field, with paths into the checkpoint', () => {
    expect(at([equation({ latex: '\\frac{1}{' })], 'checkpoints.0.latex')[0]).toMatch(/^KaTeX cannot read it/);
    expect(at([equation({ latex: ' ' })], 'checkpoints.0.latex')).toEqual(['Write the equation in LaTeX.']);
    const hint = multipleChoice({ hints: ['See [this](ftp://example.org/x)'] });
    expect(at([hint], 'checkpoints.0.hints.0')[0]).toMatch(/^Links must start with http/);
    const feedback = multipleChoice({ options: multipleChoice().options.map((o) => ({ ...o, feedback: '$\\badmacro$' })) });
    expect(at([feedback], 'checkpoints.0.options.2.feedback')[0]).toMatch(/Undefined control sequence/);
    const model = equation({
      model: { modelId: 'coil-on-axis', inputs: [{ name: 'a', slider: true, min: 10, max: 2, step: 1, value: 5 }], plot: null },
    });
    expect(problemsOf([model]).some((p) => p.path.startsWith('checkpoints.0.model.'))).toBe(true);
    const settings = lessonProblems(lesson([], { chapters: [] }), context);
    expect(settings).toEqual([]);
    const bad = lesson([]);
    bad.settings.safetyNotes = '[x](javascript:void(0))';
    expect(lessonProblems(bad, context).map((p) => p.path)).toEqual(['settings.safetyNotes']);
  });

  it('keeps every problem of a many-problem lesson at a path that exists in the content', () => {
    const broken = lesson(allKinds().map((c) => ({ ...c, atMs: 95_000 }) as Checkpoint));
    const content = broken as unknown as Record<string, unknown>;
    for (const problem of lessonProblems(broken, context)) {
      const value = problem.path.split('.').reduce<unknown>((node, part) => (node as Record<string, unknown> | undefined)?.[part], content);
      expect(value, problem.path).not.toBeUndefined();
    }
  });
});

function geometryOf(checkpoint: ReturnType<typeof sign>) {
  if (checkpoint.answer.source !== 'geometry') throw new Error('fixture has a derived answer');
  return checkpoint.answer.geometry;
}
