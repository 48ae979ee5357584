import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { LessonContentSchema, type LessonContent, type LessonDto, type LessonProblem } from '@core/contracts';
import type { ApiErrorDetail } from '@/lib/api-client';
import { Autosave, type SaveDraft, type SaveState } from './autosave';
import { canRedo, canUndo, createHistory, record, redo, undo, type History } from './history';
import { groupProblems, mergeProblems, type GroupedProblems } from './problems';

/** The shared schema's hard limits, as field paths: content breaking them is kept here and not sent. */
export function hardLimitProblems(content: LessonContent): ApiErrorDetail[] {
  const parsed = LessonContentSchema.safeParse(content);
  if (parsed.success) return [];
  return parsed.error.issues.map((issue) => ({ path: issue.path.join('.'), message: issue.message }));
}

export type DraftEdit = (content: LessonContent) => LessonContent;

/**
 * The draft being edited: undo/redo over the session, autosave of every change, and the problems to
 * show (the last save's publish problems, plus the hard limits the content breaks right now).
 */
export function useStudioDraft(lesson: LessonDto, save: SaveDraft) {
  const [history, setHistory] = useState<History<LessonContent>>(() => createHistory(lesson.draft));
  const [saveState, setSaveState] = useState<SaveState>({ kind: 'saved', savedAt: lesson.savedAt });
  const [saved, setSaved] = useState<{ content: LessonContent; problems: LessonProblem[]; unpublishedChanges: boolean }>({
    content: lesson.draft,
    problems: lesson.problems,
    unpublishedChanges: lesson.unpublishedChanges,
  });
  const [autosave] = useState(
    () =>
      new Autosave({
        revision: lesson.revision,
        savedAt: lesson.savedAt,
        save,
        check: hardLimitProblems,
        onState: setSaveState,
        onSaved: (dto, content) => setSaved({ content, problems: dto.problems, unpublishedChanges: dto.unpublishedChanges }),
      }),
  );
  useEffect(() => () => autosave.dispose(), [autosave]);

  // Content the autosave already knows (the loaded draft, or one it was reset to): not an edit.
  const known = useRef<LessonContent>(lesson.draft);
  useEffect(() => {
    if (history.present === known.current) return;
    known.current = history.present;
    autosave.edit(history.present);
  }, [autosave, history.present]);

  // Leaving the page with edits not yet saved asks first.
  const unsaved = saveState.kind !== 'saved';
  useEffect(() => {
    if (!unsaved) return;
    const warn = (event: BeforeUnloadEvent) => {
      event.preventDefault();
      event.returnValue = '';
    };
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [unsaved]);

  const change = useCallback((edit: DraftEdit, group?: string) => {
    setHistory((current) => record(current, edit(current.present), { group, at: Date.now() }));
  }, []);

  /** "Load the newer version": the server's draft replaces mine, and undo starts afresh from it. */
  const load = useCallback(
    (fresh: LessonDto) => {
      known.current = fresh.draft;
      autosave.reset(fresh.revision, fresh.savedAt);
      setHistory(createHistory(fresh.draft));
      setSaved({ content: fresh.draft, problems: fresh.problems, unpublishedChanges: fresh.unpublishedChanges });
    },
    [autosave],
  );

  const content = history.present;
  const problems: GroupedProblems = useMemo(() => {
    const fromSave = groupProblems(saved.content, saved.problems);
    const limits = saveState.kind === 'rejected' ? groupProblems(content, saveState.details) : groupProblems(content, []);
    return mergeProblems(fromSave, limits);
  }, [saved, saveState, content]);

  const markPublished = useCallback(() => setSaved((current) => ({ ...current, unpublishedChanges: false })), []);

  return {
    content,
    markPublished,
    change,
    undo: useCallback(() => setHistory(undo), []),
    redo: useCallback(() => setHistory(redo), []),
    canUndo: canUndo(history),
    canRedo: canRedo(history),
    saveState,
    problems,
    unpublishedChanges: saved.unpublishedChanges,
    autosave,
    load,
  };
}

export type StudioDraft = ReturnType<typeof useStudioDraft>;
