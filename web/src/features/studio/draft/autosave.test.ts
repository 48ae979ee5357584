import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { DraftSavedDto, LessonContent } from '@core/contracts';
import { ApiError } from '@/lib/api-client';
import { Autosave, AUTOSAVE_DEBOUNCE_MS, DraftConflictError, type SaveState } from './autosave';

function content(title: string): LessonContent {
  return {
    settings: { title, description: '', tags: [], level: '', safetyNotes: '', minSpacingMs: 500 },
    chapters: [],
    checkpoints: [],
  };
}

type Call = { revision: number; content: LessonContent; resolve: (dto: DraftSavedDto) => void; reject: (error: unknown) => void };

function setup(check: (c: LessonContent) => { path: string; message: string }[] = () => []) {
  const calls: Call[] = [];
  const states: SaveState[] = [];
  const saved: LessonContent[] = [];
  const autosave = new Autosave({
    revision: 4,
    savedAt: '2026-01-05T14:00:00.000Z',
    save: (revision, sent) => new Promise<DraftSavedDto>((resolve, reject) => calls.push({ revision, content: sent, resolve, reject })),
    check,
    onState: (state) => states.push(state),
    onSaved: (_dto, sent) => saved.push(sent),
  });
  const ok = (revision: number, at = '2026-01-05T14:02:00.000Z'): DraftSavedDto => ({
    revision,
    savedAt: at,
    problems: [],
    unpublishedChanges: true,
  });
  return { autosave, calls, states, saved, ok };
}

beforeEach(() => vi.useFakeTimers());
afterEach(() => vi.useRealTimers());

describe('autosave', () => {
  it('waits for a pause in editing, then saves the newest content once', async () => {
    const { autosave, calls, ok } = setup();
    autosave.edit(content('A'));
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DEBOUNCE_MS - 100);
    autosave.edit(content('AB'));
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DEBOUNCE_MS - 100);
    expect(calls).toHaveLength(0);
    expect(autosave.current).toEqual({ kind: 'pending' });
    await vi.advanceTimersByTimeAsync(100);
    expect(calls).toHaveLength(1);
    expect(calls[0]!.revision).toBe(4);
    expect(calls[0]!.content.settings.title).toBe('AB');
    expect(autosave.current).toEqual({ kind: 'saving' });
    calls[0]!.resolve(ok(5));
    await vi.advanceTimersByTimeAsync(0);
    expect(autosave.current).toEqual({ kind: 'saved', savedAt: '2026-01-05T14:02:00.000Z' });
    expect(autosave.hasUnsaved).toBe(false);
    expect(autosave.currentRevision).toBe(5);
  });

  it('sends an edit made during a save right after it, with the new revision', async () => {
    const { autosave, calls, ok, saved } = setup();
    autosave.edit(content('one'));
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DEBOUNCE_MS);
    autosave.edit(content('two'));
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DEBOUNCE_MS * 3);
    expect(calls).toHaveLength(1); // never two requests at once
    calls[0]!.resolve(ok(5));
    await vi.advanceTimersByTimeAsync(0);
    expect(calls).toHaveLength(2);
    expect(calls[1]!.revision).toBe(5);
    expect(calls[1]!.content.settings.title).toBe('two');
    expect(autosave.hasUnsaved).toBe(true);
    calls[1]!.resolve(ok(6));
    await vi.advanceTimersByTimeAsync(0);
    expect(saved.map((c) => c.settings.title)).toEqual(['one', 'two']);
    expect(autosave.current.kind).toBe('saved');
  });

  it('retries a failed save with a growing wait and never drops it', async () => {
    const { autosave, calls, ok } = setup();
    autosave.edit(content('keep me'));
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DEBOUNCE_MS);
    calls[0]!.reject(new ApiError(0, 'network_error', 'Pinfield could not reach its server.'));
    await vi.advanceTimersByTimeAsync(0);
    expect(autosave.current).toEqual({ kind: 'retrying', attempt: 1, retryInMs: 5000, message: 'Pinfield could not reach its server.' });
    await vi.advanceTimersByTimeAsync(4999);
    expect(calls).toHaveLength(1);
    await vi.advanceTimersByTimeAsync(1);
    expect(calls).toHaveLength(2);
    calls[1]!.reject(new ApiError(503, 'unavailable', 'Down for a moment.'));
    await vi.advanceTimersByTimeAsync(0);
    expect(autosave.current).toMatchObject({ kind: 'retrying', attempt: 2, retryInMs: 10_000 });
    autosave.edit(content('keep me too')); // an edit while waiting does not restart the wait
    expect(autosave.current).toMatchObject({ kind: 'retrying', attempt: 2 });
    await vi.advanceTimersByTimeAsync(10_000);
    expect(calls).toHaveLength(3);
    expect(calls[2]!.content.settings.title).toBe('keep me too');
    calls[2]!.resolve(ok(5));
    await vi.advanceTimersByTimeAsync(0);
    expect(autosave.current.kind).toBe('saved');
  });

  it('stops on an edit conflict, keeps the edits, and overwrites only when asked', async () => {
    const { autosave, calls, ok } = setup();
    autosave.edit(content('mine'));
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DEBOUNCE_MS);
    const conflict = { revision: 9, savedAt: '2026-01-05T14:05:00.000Z', savedBy: 'Ines Marlow (demo)' };
    calls[0]!.reject(new DraftConflictError(conflict));
    await vi.advanceTimersByTimeAsync(0);
    expect(autosave.current).toEqual({ kind: 'conflict', conflict });
    autosave.edit(content('mine, more'));
    await vi.advanceTimersByTimeAsync(120_000);
    expect(calls).toHaveLength(1);
    expect(autosave.hasUnsaved).toBe(true);
    autosave.overwrite(9);
    expect(calls).toHaveLength(2);
    expect(calls[1]!.revision).toBe(9);
    expect(calls[1]!.content.settings.title).toBe('mine, more');
    calls[1]!.resolve(ok(10));
    await vi.advanceTimersByTimeAsync(0);
    expect(autosave.current.kind).toBe('saved');
  });

  it('loading the newer version forgets my edits and continues from its revision', async () => {
    const { autosave, calls, ok } = setup();
    autosave.edit(content('mine'));
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DEBOUNCE_MS);
    calls[0]!.reject(new DraftConflictError({ revision: 9, savedAt: '2026-01-05T14:05:00.000Z', savedBy: null }));
    await vi.advanceTimersByTimeAsync(0);
    autosave.reset(9, '2026-01-05T14:05:00.000Z');
    expect(autosave.hasUnsaved).toBe(false);
    autosave.edit(content('after'));
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DEBOUNCE_MS);
    expect(calls[1]!.revision).toBe(9);
    calls[1]!.resolve(ok(10));
    await vi.advanceTimersByTimeAsync(0);
  });

  it('does not send content that breaks a hard limit, and saves once it is fixed', async () => {
    const { autosave, calls, ok } = setup((c) =>
      c.settings.title === '' ? [{ path: 'settings.title', message: 'Give the lesson a title.' }] : [],
    );
    autosave.edit(content(''));
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DEBOUNCE_MS);
    expect(calls).toHaveLength(0);
    expect(autosave.current).toMatchObject({
      kind: 'rejected',
      details: [{ path: 'settings.title', message: 'Give the lesson a title.' }],
    });
    expect(autosave.hasUnsaved).toBe(true);
    autosave.edit(content('Fixed'));
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DEBOUNCE_MS);
    expect(calls).toHaveLength(1);
    calls[0]!.resolve(ok(5));
    await vi.advanceTimersByTimeAsync(0);
    expect(autosave.current.kind).toBe('saved');
  });

  it('shows a refused save with the server message and does not loop on it', async () => {
    const { autosave, calls } = setup();
    autosave.edit(content('x'));
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DEBOUNCE_MS);
    calls[0]!.reject(new ApiError(403, 'forbidden', 'Only the owner edits this lesson.'));
    await vi.advanceTimersByTimeAsync(0);
    expect(autosave.current).toEqual({ kind: 'rejected', message: 'Only the owner edits this lesson.', details: [] });
    await vi.advanceTimersByTimeAsync(600_000);
    expect(calls).toHaveLength(1);
  });

  it('flush saves at once and resolves when everything is saved', async () => {
    const { autosave, calls, ok } = setup();
    await expect(autosave.flush()).resolves.toBe(true);
    autosave.edit(content('now'));
    const flushed = autosave.flush();
    expect(calls).toHaveLength(1);
    calls[0]!.resolve(ok(5));
    await expect(flushed).resolves.toBe(true);
    autosave.edit(content('later'));
    const failed = autosave.flush();
    calls[1]!.reject(new ApiError(0, 'network_error', 'offline'));
    await expect(failed).resolves.toBe(false);
  });
});
