import { http, HttpResponse } from 'msw';
import { useEffect } from 'react';
import type { Checkpoint, DraftSave, DraftSavedDto, LessonContent, LessonDto, PlaybackDto } from '@core/contracts';
import { nextId } from '@/testing/mocks/data';
import { server } from '@/testing/mocks/server';
import { renderWithProviders } from '@/testing/test-utils';
import type { CheckpointFormSlotProps } from './panel/checkpoint-panel';
import type { StudioPlayer } from './player/studio-player';
import { StudioScreen } from './studio-screen';

// Invented lesson data for the studio's tests.
export const CLOCK = { timeZone: 'UTC', locale: 'en-GB' };

export function buildContent(overrides: Partial<LessonContent> = {}): LessonContent {
  return {
    settings: {
      title: 'Coil on its axis (test)',
      description: '',
      tags: ['magnetism'],
      level: 'Year 11',
      safetyNotes: '',
      minSpacingMs: 500,
    },
    chapters: [],
    checkpoints: [],
    ...overrides,
  };
}

export function buildStudioLesson(draft: LessonContent, overrides: Partial<LessonDto> = {}): LessonDto {
  return {
    id: nextId(),
    title: draft.settings.title,
    tags: draft.settings.tags,
    level: draft.settings.level,
    state: 'draft',
    owner: { id: nextId(), name: 'Ada Quill' },
    recording: { id: nextId(), title: 'Coil and compass (test)', durationMs: 60_000, frameRate: 25, ready: true },
    shared: false,
    checkpointCount: draft.checkpoints.length,
    publishedVersion: null,
    unpublishedChanges: true,
    posterUrl: null,
    createdAt: '2026-01-05T13:00:00.000Z',
    updatedAt: '2026-01-05T14:00:00.000Z',
    revision: 3,
    draft,
    problems: [],
    savedAt: '2026-01-05T14:00:00.000Z',
    savedBy: { id: nextId(), name: 'Ada Quill' },
    canEdit: true,
    ...overrides,
  };
}

export function buildStudioPlayback(lesson: LessonDto, overrides: Partial<PlaybackDto> = {}): PlaybackDto {
  return {
    recordingId: lesson.recording.id,
    src: { url: 'http://127.0.0.1:4312/pinfield-media/web.mp4?X-Amz-Signature=a', type: 'video/mp4' },
    posterUrl: null,
    expiresAt: '2099-01-01T00:00:00.000Z',
    durationSeconds: 60,
    width: 1280,
    height: 720,
    thumbnailsUrl: null,
    captions: [],
    ...overrides,
  };
}

/** A player double: time in seconds, listeners by event name; `play(seconds)` moves it as playback would. */
export function fakePlayer(startSeconds = 0) {
  let time = startSeconds;
  const listeners = new Map<string, Set<() => void>>();
  const emit = (type: string) => listeners.get(type)?.forEach((listener) => listener());
  const player = {
    currentTime(seconds?: number) {
      if (seconds !== undefined) {
        time = seconds;
        emit('seeked');
      }
      return time;
    },
    paused: true,
    pause() {
      player.paused = true;
    },
    on(type: string, listener: () => void) {
      if (!listeners.has(type)) listeners.set(type, new Set());
      listeners.get(type)!.add(listener);
    },
    off(type: string, listener?: () => void) {
      if (listener) listeners.get(type)?.delete(listener);
    },
    play(seconds: number) {
      time = seconds;
      emit('timeupdate');
    },
  } satisfies StudioPlayer & Record<string, unknown>;
  return player;
}

function PlayerDouble({ player, onReady }: { player: StudioPlayer; onReady: (p: StudioPlayer) => void }) {
  useEffect(() => onReady(player), [player, onReady]);
  return <div role="region" aria-label="Video double" />;
}

/** A stand-in for the kinds' forms: one prompt box and the problems it was given, as text. */
function FormDouble({ checkpoint, onChange, problems }: CheckpointFormSlotProps) {
  const prompt = 'prompt' in checkpoint ? checkpoint.prompt : '';
  return (
    <div>
      <label>
        Prompt
        <textarea value={prompt} onChange={(event) => onChange({ ...checkpoint, prompt: event.target.value } as Checkpoint)} />
      </label>
      <ul aria-label="Form problems">
        {problems.map((p) => (
          <li key={`${p.path}:${p.message}`}>{`${p.path}: ${p.message}`}</li>
        ))}
      </ul>
    </div>
  );
}

/** Answers draft saves like the API: revision + 1, with `problemsFor(content)` as the publish problems. */
export function mockDraftSaves(lesson: LessonDto, problemsFor: (content: LessonContent) => { path: string; message: string }[] = () => []) {
  const saves: DraftSave[] = [];
  let revision = lesson.revision;
  server.use(
    http.put(`/api/lessons/${lesson.id}/draft`, async ({ request }) => {
      const body = (await request.json()) as DraftSave;
      saves.push(body);
      revision += 1;
      return HttpResponse.json<DraftSavedDto>({
        revision,
        savedAt: '2026-01-05T14:02:00.000Z',
        problems: problemsFor(body.content),
        unpublishedChanges: true,
      });
    }),
  );
  return saves;
}

export function renderStudio(
  lesson: LessonDto,
  options: { player?: ReturnType<typeof fakePlayer>; playback?: PlaybackDto; problemPath?: string } = {},
) {
  const player = options.player ?? fakePlayer();
  const playback = options.playback ?? buildStudioPlayback(lesson);
  const result = renderWithProviders(
    <StudioScreen
      lesson={lesson}
      playback={playback}
      clock={CLOCK}
      previewTo={`/teacher/lessons/${lesson.id}/preview`}
      overviewTo={`/teacher/lessons/${lesson.id}`}
      initialProblemPath={options.problemPath ?? null}
      renderPlayer={(onReady) => <PlayerDouble player={player} onReady={onReady} />}
      renderCheckpointForm={(props) => <FormDouble {...props} />}
    />,
    { route: `/teacher/lessons/${lesson.id}/studio` },
  );
  return { ...result, player };
}
