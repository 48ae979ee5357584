import { describe, expect, it } from 'vitest';
import { allKinds, lesson, multipleChoice, note, numeric, shortText } from '../lessons/fixtures.test-support';
import { changedAnswerableKeys, moveProblems } from './version-compat';

// Hand-built pairs of versions.
const replace = (key: string, by: ReturnType<typeof allKinds>[number]) => lesson(allKinds().map((c) => (c.key === key ? by : c)));

describe('moveProblems', () => {
  it('finds nothing for the same answerable checkpoints, whatever else changed', () => {
    expect(moveProblems(lesson(), lesson())).toEqual([]);
    const edited = lesson([...allKinds().filter((c) => c.kind !== 'note'), note({ key: 'othernote1' })]);
    expect(moveProblems(lesson(), replace('numkey0001', numeric({ prompt: 'Corrected: {{a}}, {{N}}, {{I}}.' })))).toEqual([]);
    expect(moveProblems(lesson(), edited)).toEqual([]);
  });

  it('names a question missing from the new version', () => {
    const to = lesson(allKinds().filter((c) => c.key !== 'stkey00001'));
    expect(moveProblems(lesson(), to)).toEqual([
      'The question “Name the law that links the current to…” (stkey00001) is not in the new version, so its answers would have nowhere to go.',
    ]);
  });

  it('names a question whose kind changed', () => {
    const to = replace('mckey00001', shortText({ key: 'mckey00001', atMs: 10_000, label: 'Needle' }));
    expect(moveProblems(lesson(), to)).toEqual([
      'The question “Which way does the needle turn?” (mckey00001) is multiple choice in the current version and short answer in the new one.',
    ]);
  });

  it('names a question the new version adds', () => {
    const to = lesson([...allKinds(), multipleChoice({ key: 'newmc00001', atMs: 85_000, label: 'Extra' })]);
    expect(moveProblems(lesson(), to)).toEqual([
      'The new version adds the question “Extra” (newmc00001); students assigned the current version never saw it.',
    ]);
  });
});

describe('changedAnswerableKeys', () => {
  it('is empty between equal versions, and ignores key order inside a checkpoint', () => {
    const reordered = lesson(allKinds().map((c) => Object.fromEntries(Object.entries(c).reverse()) as typeof c));
    expect(changedAnswerableKeys(lesson(), reordered)).toEqual([]);
  });

  it('lists answerable checkpoints whose content differs, in time order, and not notes or equation cards', () => {
    const to = lesson(
      allKinds().map((c) => {
        if (c.key === 'numkey0001') return numeric({ expected: 'mu0*N*I/(2*a)*1.0', atMs: 20_000 });
        if (c.key === 'mckey00001') return multipleChoice({ label: 'Needle' });
        if (c.kind === 'note') return note({ body: 'Switch off the supply between readings.' });
        return c;
      }),
    );
    expect(changedAnswerableKeys(lesson(), to)).toEqual(['mckey00001', 'numkey0001']);
  });

  it('leaves out keys that are not in both versions', () => {
    const to = lesson(allKinds().filter((c) => c.key !== 'stkey00001'));
    expect(changedAnswerableKeys(lesson(), to)).toEqual([]);
  });
});
