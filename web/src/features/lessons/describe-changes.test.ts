import { describe, expect, it } from 'vitest';
import { describeChanges, joinWords } from './describe-changes';

const none = { added: [], removed: [], edited: [], chaptersChanged: false, settings: [] };

describe('describeChanges', () => {
  it('says nothing when nothing changed', () => {
    expect(describeChanges(none)).toEqual([]);
  });

  it('names checkpoints by label and fields in words; an unknown field is split into words', () => {
    expect(
      describeChanges({
        ...none,
        added: [
          { key: 'aaaaaa', label: 'A' },
          { key: 'bbbbbb', label: 'B' },
          { key: 'cccccc', label: 'C' },
        ],
        edited: [
          { key: 'dddddd', label: 'D', fields: ['revealAtMs', 'someNewField'] },
          { key: 'eeeeee', label: 'E', fields: [] },
        ],
        settings: ['minSpacingMs'],
      }),
    ).toEqual([
      'Added “A”, “B” and “C”.',
      'Edited “D”: reveal time and some new field.',
      'Edited “E”.',
      'Changed the lesson’s minimum spacing between checkpoints.',
    ]);
  });

  it('joins words as a sentence does', () => {
    expect(joinWords([])).toBe('');
    expect(joinWords(['a'])).toBe('a');
    expect(joinWords(['a', 'b'])).toBe('a and b');
  });
});
