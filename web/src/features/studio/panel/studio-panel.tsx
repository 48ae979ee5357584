import type { ReactNode } from 'react';
import type { Chapter, Checkpoint, LessonContent, LessonSettings } from '@core/contracts';
import type { GroupedProblems } from '../draft/problems';
import { ChaptersEditor } from './chapters-editor';
import { CheckpointPanel, type CheckpointFormSlotProps } from './checkpoint-panel';
import { ProblemsList, type Selection } from './problems-list';
import { SettingsEditor } from './settings-editor';

type StudioPanelProps = {
  lessonId: string;
  content: LessonContent;
  durationMs: number;
  selection: Selection;
  problems: GroupedProblems;
  selected: Checkpoint | null;
  renderForm: (props: CheckpointFormSlotProps) => ReactNode;
  onSelect: (target: Selection) => void;
  onCheckpointChange: (next: Checkpoint) => void;
  onMoveTo: (atMs: number) => string | null;
  onDelete: (key: string) => void;
  onDuplicate: (key: string) => void;
  onSettings: (patch: Partial<LessonSettings>, field: keyof LessonSettings) => void;
  onChapter: (key: string, patch: Partial<Omit<Chapter, 'key'>>, field: string) => void;
  onDeleteChapter: (key: string) => void;
};

/** The side panel: problems first, then the selected checkpoint or chapter, or the lesson's settings and chapters. */
export function StudioPanel(props: StudioPanelProps) {
  const { content, selection, problems, selected } = props;
  const chapterKey = selection?.type === 'chapter' ? selection.key : null;
  return (
    <aside
      aria-label="Side panel"
      className="flex min-w-0 flex-col gap-5 rounded-lg border border-line bg-surface p-4 lg:sticky lg:top-4 lg:max-h-[calc(100dvh-2rem)] lg:overflow-y-auto"
    >
      <ProblemsList content={content} problems={problems} onSelect={props.onSelect} />
      {selected ? (
        <CheckpointPanel
          key={selected.key}
          checkpoint={selected}
          problems={problems.checkpoints.get(selected.key) ?? []}
          lessonId={props.lessonId}
          durationMs={props.durationMs}
          renderForm={props.renderForm}
          onChange={props.onCheckpointChange}
          onMoveTo={props.onMoveTo}
          onDelete={() => props.onDelete(selected.key)}
          onDuplicate={() => props.onDuplicate(selected.key)}
          onClose={() => props.onSelect(null)}
        />
      ) : (
        <>
          {chapterKey === null ? (
            <SettingsEditor
              settings={content.settings}
              problems={problems.settings}
              lessonId={props.lessonId}
              onChange={props.onSettings}
            />
          ) : null}
          <ChaptersEditor
            chapters={content.chapters}
            durationMs={props.durationMs}
            selectedKey={chapterKey}
            problems={problems.chapters}
            onSelect={(key) => props.onSelect({ type: 'chapter', key })}
            onChange={props.onChapter}
            onDelete={props.onDeleteChapter}
          />
        </>
      )}
    </aside>
  );
}
