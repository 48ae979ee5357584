import { useQuery } from '@tanstack/react-query';
import { useMemo, useState, type ReactNode } from 'react';
import type { LessonDto, PlaybackDto } from '@core/contracts';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { LiveRegion } from '@/components/ui/live-region';
import type { SchoolClock } from '@/lib/format';
import { getLesson } from '@/features/lessons/api/get-lesson';
import { thumbnailsQueryOptions } from './api/get-lesson-media';
import { saveStudioDraft } from './api/save-studio-draft';
import { replaceCheckpoint, checkpointEditGroup, updateSettings, updateChapter, removeChapter } from './draft/content-edits';
import { useStudioDraft } from './draft/use-studio-draft';
import { ConflictPanel } from './header/conflict-panel';
import { StudioHeader } from './header/studio-header';
import { StudioPanel } from './panel/studio-panel';
import type { CheckpointFormSlotProps } from './panel/checkpoint-panel';
import type { Selection } from './panel/problems-list';
import { PinMenu } from './pinning/pin-menu';
import { usePlayerTime, type StudioPlayer } from './player/studio-player';
import { HelpSheet } from './shortcuts/help-sheet';
import { useStudioShortcuts } from './shortcuts/use-studio-shortcuts';
import { PublishSurface } from './header/publish-surface';
import { KindPickerDialog } from './pinning/kind-picker-dialog';
import { snapToFrame, effectiveFrameRate, zoomIn, zoomOut } from './timeline/timeline-math';
import { parseThumbnails } from './timeline/thumbnails';
import { Timeline } from './timeline/timeline';
import type { TimeRange } from './timeline/chapter-lane';
import { Transcript } from './transcript/transcript';
import { useStudioActions, type Notice } from './use-studio-actions';
import { selectionFromProblemPath } from './selection';

export type StudioScreenProps = {
  lesson: LessonDto;
  playback: PlaybackDto;
  clock: SchoolClock;
  /** The video player; call onReady with it once it exists. */
  renderPlayer: (onReady: (player: StudioPlayer) => void) => ReactNode;
  renderCheckpointForm: (props: CheckpointFormSlotProps) => ReactNode;
  previewTo: string;
  overviewTo: string;
  /** `?problem=checkpoints.3.prompt` from a problems link elsewhere: open that place first. */
  initialProblemPath?: string | null;
};

/** The lesson studio: player and transcript, the timeline under them, the side panel, and the header. */
export function StudioScreen(props: StudioScreenProps) {
  const { lesson, playback, clock } = props;
  const draft = useStudioDraft(lesson, (revision, content) => saveStudioDraft(lesson.id, revision, content));
  const { content, change } = draft;
  const durationMs = Math.round(lesson.recording.durationMs ?? playback.durationSeconds * 1000);
  const frameRate = effectiveFrameRate(lesson.recording.frameRate);
  const [player, setPlayer] = useState<StudioPlayer | null>(null);
  const { currentMs, seek, readMs } = usePlayerTime(player);
  const [selection, setSelection] = useState<Selection>(() => selectionFromProblemPath(lesson.draft, props.initialProblemPath ?? null));
  const [notice, setNotice] = useState<Notice | null>(null);
  const [zoom, setZoom] = useState(1);
  const [range, setRange] = useState<TimeRange | null>(null);
  const [helpOpen, setHelpOpen] = useState(false);
  const [publishOpen, setPublishOpen] = useState(false);
  const [pinAt, setPinAt] = useState<number | null>(null);
  const [publishedVersion, setPublishedVersion] = useState(lesson.publishedVersion);

  const actions = useStudioActions({
    draft,
    durationMs,
    frameRate,
    selection,
    setSelection,
    setNotice,
    readMs,
    seek,
    pause: () => player?.pause(),
    range,
    setRange,
  });

  const thumbnails = useQuery(thumbnailsQueryOptions(lesson.id, playback.thumbnailsUrl !== null));
  const tiles = useMemo(() => (thumbnails.data ? parseThumbnails(thumbnails.data) : null), [thumbnails.data]);
  const tilesNote =
    playback.thumbnailsUrl === null
      ? 'This recording has no thumbnails, so the strip is left out.'
      : thumbnails.isError
        ? 'The thumbnails could not be loaded; the timeline works without them.'
        : null;

  const problemKeys = useMemo(() => new Set([...draft.problems.checkpoints.keys(), ...draft.problems.chapters.keys()]), [draft.problems]);

  const { pinPrefix } = useStudioShortcuts((action) => {
    switch (action.type) {
      case 'undo':
        return draft.undo();
      case 'redo':
        return draft.redo();
      case 'pin':
        return actions.pin(action.kind);
      case 'nudge':
        return actions.nudge(action.frames);
      case 'nudge-seconds':
        return actions.nudge(0, action.seconds);
      case 'step-playhead':
        return actions.stepPlayhead(action.frames);
      case 'delete':
        return actions.selected ? actions.remove(actions.selected.key) : undefined;
      case 'deselect':
        return setSelection(null);
      case 'zoom':
        return setZoom((z) => (action.direction === 'in' ? zoomIn(z) : zoomOut(z)));
      case 'chapter-here':
        return actions.addChapterHere();
      case 'help':
        return setHelpOpen((open) => !open);
      case 'pin-prefix':
        return undefined;
    }
  });

  const conflict = draft.saveState.kind === 'conflict' ? draft.saveState.conflict : null;
  const currentFrame = snapToFrame(currentMs, frameRate);

  return (
    <div className="flex flex-col gap-3">
      <Banner tone="info" title="The studio needs a wider screen" className="md:hidden">
        Building a lesson needs a laptop, desktop or projector (at least 768 pixels wide). On a phone, open the student preview instead.
      </Banner>
      <StudioHeader
        title={content.settings.title}
        publishedVersion={publishedVersion}
        unpublishedChanges={draft.unpublishedChanges}
        saveState={draft.saveState}
        clock={clock}
        canUndo={draft.canUndo}
        canRedo={draft.canRedo}
        onUndo={draft.undo}
        onRedo={draft.redo}
        onRetry={() => void draft.autosave.flush()}
        onHelp={() => setHelpOpen(true)}
        onPublish={() => setPublishOpen(true)}
        previewTo={props.previewTo}
        overviewTo={props.overviewTo}
      />
      {conflict ? (
        <ConflictPanel
          conflict={conflict}
          clock={clock}
          onOverwrite={() => draft.autosave.overwrite(conflict.revision)}
          onLoadNewer={async () => {
            draft.load(await getLesson(lesson.id));
            setSelection(null);
          }}
        />
      ) : null}
      {draft.saveState.kind === 'rejected' ? (
        <Banner tone="error" title="Not saved yet">
          {draft.saveState.message} Your edits are kept on this page.
        </Banner>
      ) : null}
      <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_24rem] xl:grid-cols-[minmax(0,1fr)_28rem]">
        <div className="flex min-w-0 flex-col gap-3">
          <div className="grid gap-3 min-[1200px]:grid-cols-[minmax(0,1fr)_18rem]">
            <div className="min-w-0">{props.renderPlayer(setPlayer)}</div>
            <Transcript
              lessonId={lesson.id}
              captions={playback.captions}
              currentMs={currentMs}
              onSeek={seek}
              onPinAt={(ms) => {
                seek(ms);
                setPinAt(ms);
              }}
              className="max-h-80 min-[1200px]:max-h-[min(60vh,32rem)]"
            />
          </div>
          <div className="flex flex-wrap items-center gap-3">
            <PinMenu atMs={currentFrame} onPin={(kind) => actions.pin(kind)} />
            <LiveRegion className="min-w-0 flex-1">
              {pinPrefix ? <p className="text-sm font-bold">Pin: press 1 to 7 for the kind (? lists them).</p> : null}
              {notice && !pinPrefix ? (
                <p
                  className={`flex flex-wrap items-center gap-2 text-sm ${notice.tone === 'error' ? 'font-bold text-danger' : 'text-ink'}`}
                >
                  {notice.text}
                  {notice.action ? (
                    <Button size="sm" variant="secondary" onClick={notice.action.run}>
                      {notice.action.label}
                    </Button>
                  ) : null}
                </p>
              ) : null}
            </LiveRegion>
          </div>
          <Timeline
            durationMs={durationMs}
            frameRate={frameRate}
            currentMs={currentMs}
            checkpoints={content.checkpoints}
            chapters={content.chapters}
            selectedCheckpoint={selection?.type === 'checkpoint' ? selection.key : null}
            selectedChapter={selection?.type === 'chapter' ? selection.key : null}
            problemKeys={problemKeys}
            zoom={zoom}
            onZoom={setZoom}
            tiles={tiles}
            tilesNote={tilesNote}
            range={range}
            onRange={setRange}
            onSeek={seek}
            onSelectCheckpoint={(key) => setSelection({ type: 'checkpoint', key })}
            onSelectChapter={(key) => setSelection({ type: 'chapter', key })}
            onMoveCheckpoint={actions.moveWithNotice}
            onAddChapter={actions.addChapterHere}
          />
        </div>
        <StudioPanel
          lessonId={lesson.id}
          content={content}
          durationMs={durationMs}
          selection={selection}
          problems={draft.problems}
          selected={actions.selected}
          renderForm={props.renderCheckpointForm}
          onSelect={(target) => {
            setSelection(target);
            const at = target?.type === 'checkpoint' ? content.checkpoints.find((c) => c.key === target.key)?.atMs : undefined;
            if (at !== undefined) seek(at);
          }}
          onCheckpointChange={(next) => {
            const before = content.checkpoints.find((c) => c.key === next.key);
            change((c) => replaceCheckpoint(c, next), checkpointEditGroup(before, next));
          }}
          onMoveTo={(atMs) => (actions.selected ? actions.moveTo(actions.selected.key, atMs) : null)}
          onDelete={actions.remove}
          onDuplicate={actions.duplicate}
          onSettings={(patch, field) => change((c) => updateSettings(c, patch), `settings:${field}`)}
          onChapter={(key, patch, field) => change((c) => updateChapter(c, key, patch), `chapter:${key}:${field}`)}
          onDeleteChapter={(key) => {
            change((c) => removeChapter(c, key));
            setSelection(null);
            setNotice({ tone: 'info', text: 'Chapter deleted.', action: { label: 'Undo', run: draft.undo } });
          }}
        />
      </div>
      <HelpSheet open={helpOpen} onClose={() => setHelpOpen(false)} />
      <KindPickerDialog
        atMs={pinAt}
        onClose={() => setPinAt(null)}
        onPick={(kind) => {
          if (pinAt !== null) actions.pin(kind, pinAt);
          setPinAt(null);
        }}
      />
      <PublishSurface
        open={publishOpen}
        onClose={() => setPublishOpen(false)}
        lessonId={lesson.id}
        draft={draft}
        nextVersion={(publishedVersion ?? 0) + 1}
        onPublished={(version) => {
          setPublishedVersion(version.number);
          setPublishOpen(false);
          setNotice({
            tone: 'info',
            text: `Published version ${version.number}. Students assigned the lesson from now on get this version.`,
          });
        }}
        onSelect={setSelection}
      />
    </div>
  );
}
