import { describe, expect, it } from 'vitest';
import type { LessonContent } from '@core/contracts';
import { newCheckpoint } from '@core/lessons/new-checkpoint';
import { checkpointEditGroup, copyOfCheckpoint, moveCheckpoint, removeCheckpoint, addCheckpoint } from './content-edits';

const settings = { title: 'Coil', description: '', tags: [], level: '', safetyNotes: '', minSpacingMs: 500 };

describe('content edits', () => {
  it('keeps checkpoints in time order when adding and moving', () => {
    const a = newCheckpoint('note', 3000);
    const b = newCheckpoint('numeric', 1000);
    let content: LessonContent = { settings, chapters: [], checkpoints: [] };
    content = addCheckpoint(addCheckpoint(content, a), b);
    expect(content.checkpoints.map((c) => c.key)).toEqual([b.key, a.key]);
    content = moveCheckpoint(content, b.key, 5000);
    expect(content.checkpoints.map((c) => c.key)).toEqual([a.key, b.key]);
    expect(removeCheckpoint(content, a.key).checkpoints.map((c) => c.key)).toEqual([b.key]);
  });

  it('moves a prediction with its reveal, and copies get a new key', () => {
    const p = newCheckpoint('prediction', 2000); // reveal at 7000
    const content = moveCheckpoint({ settings, chapters: [], checkpoints: [p] }, p.key, 4000);
    expect(content.checkpoints[0]).toMatchObject({ atMs: 4000, revealAtMs: 9000 });
    const copy = copyOfCheckpoint(p, 2600);
    expect(copy.key).not.toBe(p.key);
    expect(copy).toMatchObject({ atMs: 2600, revealAtMs: 7600, kind: 'prediction' });
  });

  it('names the undo group after the fields that changed', () => {
    const mc = newCheckpoint('multiple-choice', 0);
    expect(checkpointEditGroup(mc, { ...mc, prompt: 'Wh' })).toBe(`checkpoint:${mc.key}:prompt`);
    expect(checkpointEditGroup(mc, { ...mc, prompt: 'x', label: 'y' })).toBe(`checkpoint:${mc.key}:label,prompt`);
  });
});
