import { describe, expect, it } from 'vitest';
import type { LessonContent } from '../contracts';
import { newCheckpoint } from './new-checkpoint';
import { chaptersVtt, checkpointsVtt, vttTime } from './lesson-vtt';

function content(overrides: Partial<LessonContent>): LessonContent {
  return {
    settings: { title: 'Tracks (demo)', description: '', tags: [], level: '', safetyNotes: '', minSpacingMs: 500 },
    chapters: [],
    checkpoints: [],
    ...overrides,
  };
}

describe('vttTime', () => {
  it('writes hours, minutes, seconds and three-digit milliseconds (W3C WebVTT, "WebVTT timestamp")', () => {
    expect(vttTime(0)).toBe('00:00:00.000');
    expect(vttTime(75_500)).toBe('00:01:15.500');
    expect(vttTime(3_723_004)).toBe('01:02:03.004');
  });
});

describe('chaptersVtt', () => {
  it('one cue per chapter in time order, titles escaped, untitled chapters numbered', () => {
    const text = chaptersVtt(
      content({
        chapters: [
          { key: 'chapterbb', title: 'Measure <B> & compare', startMs: 4000, endMs: 9000 },
          { key: 'chapteraa', title: '', startMs: 0, endMs: 4000 },
        ],
      }),
    );
    expect(text).toBe(
      'WEBVTT\n\nchapteraa\n00:00:00.000 --> 00:00:04.000\nChapter 2\n\nchapterbb\n00:00:04.000 --> 00:00:09.000\nMeasure &lt;B&gt; &amp; compare\n',
    );
  });

  it('a draft chapter ending before it starts still gives a cue that ends after it begins', () => {
    const text = chaptersVtt(content({ chapters: [{ key: 'chapteraa', title: 'Odd', startMs: 5000, endMs: 2000 }] }));
    expect(text).toContain('00:00:05.000 --> 00:00:05.001');
  });

  it('no chapters: just the signature', () => {
    expect(chaptersVtt(content({}))).toBe('WEBVTT\n');
  });
});

describe('checkpointsVtt', () => {
  it('cues run from each pin to the next; the payload is key, kind and label, and nothing of the answer', () => {
    const question = {
      ...newCheckpoint('numeric', 6000),
      key: 'numericaa',
      prompt: 'Find $B$ for {{a}}',
      label: 'B at the centre --> µT',
      expected: '62.8 uT',
    };
    const note = { ...newCheckpoint('note', 2000), key: 'noteaaaa', body: 'Watch the needle.' };
    const text = checkpointsVtt(content({ checkpoints: [question, note] }));
    const blocks = text.split('\n\n');
    expect(blocks[0]).toBe('WEBVTT');
    expect(blocks[1]).toBe('noteaaaa\n00:00:02.000 --> 00:00:06.000\n{"key":"noteaaaa","kind":"note","label":"Watch the needle."}');
    expect(blocks[2]).toBe(
      'numericaa\n00:00:06.000 --> 00:00:06.001\n{"key":"numericaa","kind":"numeric","label":"B at the centre --\\u003e µT"}\n',
    );
    expect(JSON.parse(blocks[2]!.split('\n')[2]!)).toEqual({ key: 'numericaa', kind: 'numeric', label: 'B at the centre --> µT' });
    expect(text).not.toContain('62.8');
    // "-->" in cue text would start a new cue: only the timing lines may hold it.
    expect(text.split('\n').filter((line) => line.includes('-->'))).toEqual([
      '00:00:02.000 --> 00:00:06.000',
      '00:00:06.000 --> 00:00:06.001',
    ]);
  });
});
