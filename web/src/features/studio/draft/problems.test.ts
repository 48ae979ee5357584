import { describe, expect, it } from 'vitest';
import type { LessonContent } from '@core/contracts';
import { newChapter, newCheckpoint } from '@core/lessons/new-checkpoint';
import { countProblems, groupProblems, mergeProblems, messageAt } from './problems';

function lesson(): LessonContent {
  return {
    settings: { title: 'Coil', description: '', tags: [], level: '', safetyNotes: '', minSpacingMs: 500 },
    chapters: [newChapter(0, 5000)],
    checkpoints: [newCheckpoint('note', 1000), newCheckpoint('multiple-choice', 2000)],
  };
}

describe('problems', () => {
  it('files problems by checkpoint and chapter key, with paths relative to them', () => {
    const content = lesson();
    const grouped = groupProblems(content, [
      { path: 'checkpoints.1.options.1.text', message: 'Write the option.' },
      { path: 'checkpoints.1.atMs', message: 'Too close.' },
      { path: 'checkpoints.0', message: 'Whole note.' },
      { path: 'chapters.0.endMs', message: 'Past the end.' },
      { path: 'settings.title', message: 'Give the lesson a title.' },
      { path: 'checkpoints', message: 'Too many.' },
      { path: 'checkpoints.7.atMs', message: 'Gone since.' },
    ]);
    const mc = grouped.checkpoints.get(content.checkpoints[1]!.key);
    expect(mc).toEqual([
      { path: 'options.1.text', message: 'Write the option.' },
      { path: 'atMs', message: 'Too close.' },
    ]);
    expect(grouped.checkpoints.get(content.checkpoints[0]!.key)).toEqual([{ path: '', message: 'Whole note.' }]);
    expect(grouped.chapters.get(content.chapters[0]!.key)).toEqual([{ path: 'endMs', message: 'Past the end.' }]);
    expect(grouped.settings).toEqual([{ path: 'title', message: 'Give the lesson a title.' }]);
    expect(grouped.other.map((p) => p.path)).toEqual(['checkpoints', 'checkpoints.7.atMs']);
    expect(countProblems(grouped)).toBe(7);
    expect(messageAt(mc, 'atMs')).toBe('Too close.');
    expect(messageAt(mc, 'prompt')).toBeUndefined();
  });

  it('merges two sources', () => {
    const content = lesson();
    const key = content.checkpoints[0]!.key;
    const a = groupProblems(content, [{ path: 'checkpoints.0.body', message: 'a' }]);
    const b = groupProblems(content, [
      { path: 'checkpoints.0.label', message: 'b' },
      { path: 'settings.level', message: 'c' },
    ]);
    const merged = mergeProblems(a, b);
    expect(merged.checkpoints.get(key)?.map((p) => p.message)).toEqual(['a', 'b']);
    expect(countProblems(merged)).toBe(3);
  });
});
