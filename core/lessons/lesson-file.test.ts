import { describe, expect, it } from 'vitest';
import { CHECKPOINT_KINDS, type LessonContent } from '../contracts';
import { newChapter, newCheckpoint } from './new-checkpoint';
import { LESSON_FILE_PROBLEMS_MAX, lessonFileName, lessonFileText, parseLessonFile, toLessonFile } from './lesson-file';

function sampleContent(): LessonContent {
  return {
    settings: {
      title: 'Field of a flat coil (demo)',
      description: 'Measure $B$ at the centre & compare.',
      tags: ['magnets', 'coils'],
      level: 'Year 12',
      safetyNotes: 'Keep the current under 2 A.',
      minSpacingMs: 500,
    },
    chapters: [{ ...newChapter(0, 4000), title: 'Set-up' }],
    checkpoints: CHECKPOINT_KINDS.map((kind, index) => newCheckpoint(kind, 1000 + index * 1000)),
  };
}

const recording = { title: 'Coil demo take 2', durationMs: 12_000 };

function fileWith(change: (file: Record<string, unknown>) => void): string {
  const file = JSON.parse(lessonFileText(toLessonFile(sampleContent(), recording))) as Record<string, unknown>;
  change(file);
  return JSON.stringify(file, null, 2);
}

function lineOf(text: string, fragment: string): number {
  const index = text.indexOf(fragment);
  if (index < 0) throw new Error(`fragment ${fragment} not in the text`);
  return text.slice(0, index).split('\n').length;
}

function problemsOf(text: string) {
  const result = parseLessonFile(text);
  if (result.ok) throw new Error('expected the file to be refused');
  return result.problems;
}

describe('toLessonFile / parseLessonFile', () => {
  it('round-trips every checkpoint kind unchanged, keys included', () => {
    const content = sampleContent();
    const text = lessonFileText(toLessonFile(content, recording, new Date('2026-03-01T09:30:00Z')));
    expect(text.startsWith('{\n  "format": "pinfield.lesson",\n  "formatVersion": 1,\n  "exportedAt": "2026-03-01T09:30:00.000Z"')).toBe(
      true,
    );
    const result = parseLessonFile(text);
    expect(result).toEqual({ ok: true, content, recording });
  });

  it('accepts a file without the informational exportedAt and recording, and a byte order mark', () => {
    const text = fileWith((file) => {
      delete file.exportedAt;
      delete file.recording;
    });
    const result = parseLessonFile(`\uFEFF${text}`);
    expect(result.ok && result.recording).toBeNull();
  });

  it('names the line of a JSON syntax error', () => {
    const good = lessonFileText(toLessonFile(sampleContent(), recording));
    const lines = good.split('\n');
    const target = lines.findIndex((line) => line.includes('"level"'));
    lines[target] = lines[target]!.replace(/,$/, ''); // the comma after "level" forgotten
    const problems = problemsOf(lines.join('\n'));
    expect(problems[0]).toEqual({ line: target + 2, path: '', message: 'A comma was expected here, between two fields or two items.' });
  });

  it('refuses a trailing comma and comments, with their lines', () => {
    expect(problemsOf('{\n  "format": "pinfield.lesson",\n}\n')[0]).toMatchObject({ line: 3 });
    expect(problemsOf('{\n  // a note\n  "format": "pinfield.lesson"\n}')[0]).toEqual({
      line: 2,
      path: '',
      message: 'JSON allows no comments.',
    });
  });

  it('points a wrong type at the line of its field, with the path', () => {
    const text = fileWith((file) => {
      ((file.lesson as LessonContent).checkpoints[2] as { atMs: unknown }).atMs = 'soon';
    });
    const problems = problemsOf(text);
    const atLines = text.split('\n').flatMap((line, index) => (line.includes('"atMs": "soon"') ? [index + 1] : []));
    expect(problems).toEqual([{ line: atLines[0], path: 'lesson.checkpoints.2.atMs', message: 'Expected the time in milliseconds.' }]);
  });

  it('names an unknown checkpoint kind and lists the kinds', () => {
    const text = fileWith((file) => {
      (file.lesson as { checkpoints: { kind: string }[] }).checkpoints[0]!.kind = 'essay';
    });
    expect(problemsOf(text)).toEqual([
      {
        line: lineOf(text, '"kind": "essay"'),
        path: 'lesson.checkpoints.0.kind',
        message: 'Unknown checkpoint kind "essay": use one of multiple-choice, numeric, short-text, equation, sign, prediction, note.',
      },
    ]);
  });

  it('a missing field points at its object and says which field', () => {
    const text = fileWith((file) => {
      delete (file.lesson as { settings: Record<string, unknown> }).settings.title;
    });
    expect(problemsOf(text)).toEqual([
      {
        line: lineOf(text, '"settings": {'),
        path: 'lesson.settings.title',
        message: 'The field "title" is missing. Give the lesson a title.',
      },
    ]);
  });

  it('refuses a file without a format, another format, and a newer version', () => {
    expect(problemsOf('{\n  "lesson": {}\n}')).toEqual([
      { line: 1, path: 'format', message: 'This is not a Pinfield lesson file: "format": "pinfield.lesson" is missing.' },
      { line: 1, path: 'formatVersion', message: '"formatVersion" is missing: this Pinfield reads lesson files of format version 1.' },
    ]);
    expect(problemsOf('{\n  "format": "slides",\n  "formatVersion": 1,\n  "lesson": {}\n}')).toEqual([
      { line: 2, path: 'format', message: '"format" is "slides", not "pinfield.lesson": this is not a Pinfield lesson file.' },
    ]);
    const newer = problemsOf(fileWith((file) => (file.formatVersion = 2)));
    expect(newer).toEqual([
      {
        line: 3,
        path: 'formatVersion',
        message:
          'This file uses format version 2, written by a newer Pinfield; this one reads versions up to 1. Export the lesson again from a Pinfield that writes version 1.',
      },
    ]);
    expect(problemsOf('[1, 2]')).toEqual([{ line: 1, path: '', message: 'A lesson file is one JSON object, starting with {.' }]);
    expect(problemsOf('  \n')[0]!.message).toBe('The file is empty: a lesson file is one JSON object, starting with {.');
  });

  it('keeps the keys of the file, and refuses a key used twice', () => {
    const text = fileWith((file) => {
      const checkpoints = (file.lesson as LessonContent).checkpoints;
      checkpoints[3]!.key = checkpoints[1]!.key;
    });
    const problems = problemsOf(text);
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatchObject({ path: 'lesson.checkpoints.3.key', message: expect.stringContaining('also used by checkpoint 2') });
    const keyLines = text
      .split('\n')
      .flatMap((line, index) => (line.includes(`"key": ${JSON.stringify(JSON.parse(text).lesson.checkpoints[3].key)}`) ? [index + 1] : []));
    expect(problems[0]!.line).toBe(keyLines[1]);
  });

  it('refuses an unknown (misspelt) field instead of dropping its value', () => {
    const text = fileWith((file) => {
      const note = (file.lesson as { checkpoints: Record<string, unknown>[] }).checkpoints.at(-1)!;
      note.colour = 'red';
    });
    expect(problemsOf(text)).toEqual([
      {
        line: lineOf(text, '"colour"'),
        path: 'lesson.checkpoints.6.colour',
        message: 'Unknown field "colour": format version 1 has no such field here (is it misspelt?).',
      },
    ]);
  });

  it('refuses a field written twice in one object', () => {
    const text = '{\n  "format": "pinfield.lesson",\n  "formatVersion": 1,\n  "format": "pinfield.lesson",\n  "lesson": {}\n}';
    expect(problemsOf(text)).toEqual([
      { line: 4, path: 'format', message: 'The field "format" is written twice in this object (first on line 2): keep one.' },
    ]);
  });

  it(`lists at most ${LESSON_FILE_PROBLEMS_MAX} problems, first lines first`, () => {
    const text = fileWith((file) => {
      (file.lesson as { checkpoints: unknown[] }).checkpoints = Array.from({ length: 80 }, () => ({ kind: 'note' }));
    });
    const problems = problemsOf(text);
    expect(problems).toHaveLength(LESSON_FILE_PROBLEMS_MAX);
    expect(problems.map((p) => p.line)).toEqual([...problems.map((p) => p.line)].sort((a, b) => a - b));
  });

  it('makes a safe download name', () => {
    expect(lessonFileName('Coil: B / I?')).toBe('Coil B I.pinfield-lesson.json');
    expect(lessonFileName('...')).toBe('lesson.pinfield-lesson.json');
  });
});
