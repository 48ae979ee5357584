import type { Knex } from 'knex';
import type { LessonDto, LessonImport } from '@core/contracts';
import { lessonFileName, lessonFileText, parseLessonFile, toLessonFile, type LessonFileProblem } from '@core/lessons/lesson-file';
import type { Actor } from '../../auth/actor';
import { ValidationError } from '../../errors';
import { loadViewable as loadViewableRecording } from '../recordings/recording-access';
import { insertLesson } from './lessons.repository';
import type { LessonsService } from './lessons.service';
import { loadLessonContent } from './lesson-transfer.read-model';

/** `[{ path: 'line 12', message }]`, the shape every line-numbered refusal of the API has (rosters, captions). */
function detailsOf(problems: LessonFileProblem[]) {
  return problems.map((problem) => ({
    path: `line ${problem.line}`,
    message: problem.path === '' ? problem.message : `${problem.path}: ${problem.message}`,
  }));
}

function summaryOf(fileName: string, problems: LessonFileProblem[]): string {
  const name = fileName.trim() === '' ? 'The lesson file' : `“${fileName.trim()}”`;
  const first = problems[0]!;
  if (problems.length === 1) return `${name} has a problem on line ${first.line}: ${first.message} Nothing was imported.`;
  return `${name} has ${problems.length} problems, the first on line ${first.line}. Nothing was imported: fix them and choose the file again.`;
}

/** Export of a lesson as Pinfield's own lesson file, and import of one as a new draft. */
export function createLessonTransferService({ db, lessons }: { db: Knex; lessons: LessonsService }) {
  return {
    /** The file of the draft (editors) or a published version; `version` picks one. */
    async exportFile(actor: Actor, lessonId: string, version: number | undefined): Promise<{ fileName: string; text: string }> {
      const view = await loadLessonContent(db, actor, lessonId, { version });
      const file = toLessonFile(view.content, { title: view.recording.title, durationMs: view.recording.durationMs });
      return { fileName: lessonFileName(view.content.settings.title), text: lessonFileText(file) };
    },

    /**
     * A new draft lesson owned by the caller, on a ready recording the caller can see, holding the
     * file's content with the file's keys. Publish rules (checkpoints inside the recording, spacing)
     * are not import errors: the draft lists them as problems, as the studio shows.
     */
    async importFile(actor: Actor, input: LessonImport): Promise<LessonDto> {
      const recording = await loadViewableRecording(db, actor, input.recordingId);
      if (recording.state !== 'ready' || recording.renditionKey === null) {
        const message = `“${recording.title}” is not ready to play yet (${recording.state}), so a lesson cannot be built on it. Choose a ready recording.`;
        throw new ValidationError(message, [{ path: 'recordingId', message }], 'recording_not_ready');
      }
      const parsed = parseLessonFile(input.text);
      if (!parsed.ok)
        throw new ValidationError(summaryOf(input.fileName, parsed.problems), detailsOf(parsed.problems), 'lesson_file_invalid');
      const id = await insertLesson(db, {
        schoolId: actor.active.schoolId,
        ownerId: actor.userId,
        departmentId: actor.active.departmentId,
        recordingId: recording.id,
        content: parsed.content,
        copiedFromId: null,
      });
      return lessons.detail(actor, id);
    },
  };
}

export type LessonTransferService = ReturnType<typeof createLessonTransferService>;
