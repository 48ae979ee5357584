import { describe, expect, it } from 'vitest';
import { lesson, multipleChoice, note, numeric, shortText } from './fixtures.test-support';
import { diffContent } from './version-diff';

describe('diffContent', () => {
  it('lists every checkpoint as added for a first version, by time', () => {
    const changes = diffContent(null, lesson([numeric(), multipleChoice({ label: 'Needle' })]));
    expect(changes).toEqual({
      added: [
        { key: 'mckey00001', label: 'Needle' },
        { key: 'numkey0001', label: 'A coil of radius a has N turns…' },
      ],
      removed: [],
      edited: [],
      chaptersChanged: true,
      settings: [],
    });
  });

  it('finds added, removed and edited checkpoints by key, with the fields that differ', () => {
    const before = lesson([multipleChoice(), numeric(), note()]);
    const after = lesson([numeric({ atMs: 21_000, expected: 'mu0*N*I/(2*a) ' }), multipleChoice({ label: 'Needle' }), shortText()]);
    const changes = diffContent(before, after);
    expect(changes.added).toEqual([{ key: 'stkey00001', label: 'Name the law that links the current to…' }]);
    expect(changes.removed).toEqual([{ key: 'ntkey00001', label: 'Switch off between readings.' }]);
    expect(changes.edited).toEqual([
      { key: 'mckey00001', label: 'Needle', fields: ['label'] },
      { key: 'numkey0001', label: 'A coil of radius a has N turns…', fields: ['atMs', 'expected'] },
    ]);
    expect(changes.chaptersChanged).toBe(false);
    expect(changes.settings).toEqual([]);
  });

  it('sees nothing when only the order of the lists or of the keys differs', () => {
    const before = lesson([multipleChoice(), note()]);
    const reordered = lesson([note(), { ...multipleChoice(), options: multipleChoice().options }]);
    reordered.chapters = [...before.chapters].reverse();
    expect(diffContent(before, reordered)).toEqual({ added: [], removed: [], edited: [], chaptersChanged: false, settings: [] });
  });

  it('reports chapter and settings changes', () => {
    const before = lesson([]);
    const after = lesson([]);
    after.settings = { ...after.settings, title: 'Renamed', safetyNotes: 'Keep the current low.' };
    after.chapters = [{ ...before.chapters[0]!, title: 'Getting ready' }, before.chapters[1]!];
    const changes = diffContent(before, after);
    expect(changes.settings).toEqual(['title', 'safetyNotes']);
    expect(changes.chaptersChanged).toBe(true);
  });
});
