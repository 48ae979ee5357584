import type { Knex } from 'knex';
import type {
  StudentAssignmentDto,
  StudentHomeDto,
  StudentResultsDto,
  ViewingReport,
  ViewingResultDto,
  WatchViewDto,
} from '@core/contracts';
import { toStudentView } from '@core/lessons';
import { studentState } from '@core/assignments';
import type { Actor } from '../../auth/actor';
import { NotFoundError } from '../../errors';
import type { MediaUrls } from '../recordings/media-urls';
import type { RecordingMediaService } from '../recordings/recording-media.service';
import type { AssignmentContext, AssignmentContexts } from '../responses/assignment-context';
import { ensureDrawnValues, studentSeed } from '../responses/drawn-values';
import { stampProgress, type ProgressKey } from './progress.repository';
import { presentResults } from './student-results.presenter';
import { completionFor } from './watch-completion';
import { createWatchMedia } from './watch-media';
import { requireAccepting, standingOf } from './watch-standing';
import { recordViewing } from './viewing';
import { presentBook, presentWatchAssignment } from './watch.presenter';
import * as read from './watch.read-model';

interface Deps {
  db: Knex;
  contexts: AssignmentContexts;
  media: RecordingMediaService;
  urls: MediaUrls;
}

/** Within this much of the end a viewing counts as finished: the next visit starts from the beginning. */
const FINISHED_WITHIN_MS = 2_000;

const keyOf = (ctx: AssignmentContext, actor: Actor): ProgressKey => ({
  assignmentId: ctx.id,
  studentId: actor.userId,
  schoolId: ctx.schoolId,
});

/** Home lists what is still to do first (soonest due first), then what is done or closed (latest first). */
function homeOrder(a: StudentAssignmentDto, b: StudentAssignmentDto): number {
  const finished = (x: StudentAssignmentDto) => (x.state === 'done' || x.state === 'closed' ? 1 : 0);
  const group = finished(a) - finished(b);
  if (group !== 0) return group;
  return finished(a) === 0 ? a.dueAt.localeCompare(b.dueAt) : b.dueAt.localeCompare(a.dueAt);
}

/**
 * The student side of an assignment: the home list, the watch page (allow-listed checkpoints with
 * this student's stored values, playback while answers are taken, the stored answers as the
 * policies show them), the safety acknowledgement, viewing coverage and the results page. Every
 * assignment is reached through `contexts.forStudent`: a student of its class, in the active school.
 */
export function createWatchService({ db, contexts, media, urls }: Deps) {
  const watchMedia = createWatchMedia({ db, media });

  /** Assignments listed for a student that stopped being theirs in between are left out. */
  async function contextOrNull(actor: Actor, assignmentId: string): Promise<AssignmentContext | null> {
    try {
      return await contexts.forStudent(actor, assignmentId);
    } catch (error) {
      if (error instanceof NotFoundError) return null;
      throw error;
    }
  }

  return {
    async home(actor: Actor): Promise<StudentHomeDto> {
      const now = new Date();
      const ids = await read.listAssignedIds(db, actor.active.schoolId, actor.userId);
      const found = (await Promise.all(ids.map((id) => contextOrNull(actor, id)))).filter((c): c is AssignmentContext => c !== null);
      const shownIds = found.map((ctx) => ctx.id);
      const [progress, answered, posters] = await Promise.all([
        read.listProgress(db, actor.active.schoolId, actor.userId, shownIds),
        read.listAnsweredKeys(db, actor.active.schoolId, actor.userId, shownIds),
        read.listPosterKeys(
          db,
          actor.active.schoolId,
          found.map((ctx) => ctx.recordingId),
        ),
      ]);
      const assignments = await Promise.all(
        found.map(async (ctx): Promise<StudentAssignmentDto> => {
          const row = progress.get(ctx.id);
          const keys = answered.get(ctx.id) ?? new Set<string>();
          const standing = standingOf(ctx, now);
          const completion = completionFor(ctx, row, keys);
          const opened = row?.firstOpenedAt != null;
          return {
            id: ctx.id,
            lessonTitle: ctx.lessonTitle,
            className: ctx.className,
            teacherName: ctx.teacherName,
            opensAt: ctx.opensAt.toISOString(),
            dueAt: ctx.dueAt.toISOString(),
            lateUntil: ctx.lateUntil?.toISOString() ?? null,
            timeZone: ctx.timeZone,
            state: studentState({
              phase: standing.phase,
              opened,
              answered: keys.size,
              watchedSeconds: row?.watchedSeconds ?? 0,
              done: completion.done,
            }),
            completion,
            isNew: !opened && standing.accepting,
            gradeUpdated: row?.gradeUpdatedAt != null && (row.resultsSeenAt === null || row.gradeUpdatedAt > row.resultsSeenAt),
            posterUrl: await urls.poster(posters.get(ctx.recordingId) ?? null),
          };
        }),
      );
      return { assignments: assignments.sort(homeOrder), serverTime: now.toISOString() };
    },

    /** The watch page's one load; marks the first opening and draws the student's numbers if not done yet. */
    async view(actor: Actor, assignmentId: string): Promise<WatchViewDto> {
      const ctx = await contexts.forStudent(actor, assignmentId);
      const now = new Date();
      const standing = requireAccepting(ctx, now);
      const drawn = await ensureDrawnValues(db, ctx, actor.userId);
      const [playback, progress, responses] = await Promise.all([
        watchMedia.playback(ctx),
        stampProgress(db, keyOf(ctx, actor), { openedAt: now }),
        read.listStudentResponses(db, ctx.schoolId, ctx.id, actor.userId),
      ]);
      const answered = new Set(responses.map((r) => r.checkpointKey));
      const completion = completionFor(ctx, progress, answered);
      const state = studentState({
        phase: standing.phase,
        opened: true,
        answered: answered.size,
        watchedSeconds: progress.watchedSeconds,
        done: completion.done,
      });
      return {
        assignment: presentWatchAssignment(ctx, state, standing),
        view: toStudentView(ctx.content, { seed: studentSeed(ctx.id, actor.userId), locale: ctx.locale, drawn }),
        playback,
        book: presentBook(ctx, actor.userId, responses, standing.closed, drawn),
        progress: {
          safetyAcknowledged: progress.safetyAcknowledgedAt !== null,
          resumeMs: progress.positionMs >= ctx.durationMs - FINISHED_WITHIN_MS ? 0 : progress.positionMs,
          completion,
        },
        serverTime: now.toISOString(),
      };
    },

    /** Records the first acknowledgement of the lesson's safety notes; later ones keep that time. */
    async acknowledgeSafety(actor: Actor, assignmentId: string): Promise<void> {
      const ctx = await contexts.forStudent(actor, assignmentId);
      const now = new Date();
      requireAccepting(ctx, now);
      await stampProgress(db, keyOf(ctx, actor), { safetyAcknowledgedAt: now });
    },

    /** Merges watched intervals into the student's coverage (see viewing.ts). */
    async recordViewing(actor: Actor, assignmentId: string, report: ViewingReport): Promise<ViewingResultDto> {
      const ctx = await contexts.forStudent(actor, assignmentId);
      const now = new Date();
      return { completion: await recordViewing(db, ctx, keyOf(ctx, actor), report, now), serverTime: now.toISOString() };
    },

    /** The student's results; readable before, during and after the assignment. Marks them seen. */
    async results(actor: Actor, assignmentId: string): Promise<StudentResultsDto> {
      const ctx = await contexts.forStudent(actor, assignmentId);
      const now = new Date();
      const standing = standingOf(ctx, now);
      const [drawn, before, responses] = await Promise.all([
        ensureDrawnValues(db, ctx, actor.userId),
        read.findProgress(db, ctx.schoolId, ctx.id, actor.userId),
        read.listStudentResponses(db, ctx.schoolId, ctx.id, actor.userId),
      ]);
      const progress = await stampProgress(db, keyOf(ctx, actor), { resultsSeenAt: now });
      const answered = new Set(responses.map((r) => r.checkpointKey));
      const completion = completionFor(ctx, progress, answered);
      const state = studentState({
        phase: standing.phase,
        opened: progress.firstOpenedAt !== null,
        answered: answered.size,
        watchedSeconds: progress.watchedSeconds,
        done: completion.done,
      });
      return presentResults({
        ctx,
        studentId: actor.userId,
        standing,
        state,
        completion,
        responses,
        drawn,
        seenBefore: before?.resultsSeenAt ?? null,
      });
    },

    async thumbnailsVtt(actor: Actor, assignmentId: string): Promise<string> {
      const ctx = await contexts.forStudent(actor, assignmentId);
      requireAccepting(ctx, new Date());
      return watchMedia.thumbnailsVtt(ctx);
    },

    async captionFile(actor: Actor, assignmentId: string, captionId: string): Promise<string> {
      const ctx = await contexts.forStudent(actor, assignmentId);
      requireAccepting(ctx, new Date());
      return watchMedia.captionFile(ctx, captionId);
    },
  };
}

export type WatchService = ReturnType<typeof createWatchService>;
