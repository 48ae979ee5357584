import type { Knex } from 'knex';
import type {
  AssignmentCreate,
  AssignmentCreatedDto,
  AssignmentDto,
  AssignmentListDto,
  AssignmentListQuery,
  AssignmentMove,
  AssignmentMovedDto,
  AssignmentUpdate,
} from '@core/contracts';
import type { Actor } from '../../auth/actor';
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from '../../errors';
import { recordAudit } from '../audit/audit.repository';
import { loadViewableLesson } from '../lessons/lesson-access';
import type { AssignmentContexts } from '../responses/assignment-context';
import * as repo from './assignments.repository';
import * as read from './assignments.read-model';
import { canManageAssignment, canViewAssignment } from './assignments.policy';
import { presentAssignment } from './assignments.presenter';
import { settingsOf } from './assignment-settings';
import { auditData, settingChanges } from './assignment-audit';
import { moveAssignment } from './assignment-move';

export interface AssignmentsDeps {
  db: Knex;
  /** The student side's cache of assignment rows: told after every change here. */
  contexts: Pick<AssignmentContexts, 'forget'>;
  now?: () => Date;
}

const duplicates = (ids: string[]) => ids.flatMap((id, index) => (ids.indexOf(id) < index ? [index] : []));

const plural = (count: number, one: string, many: string) => `${count} ${count === 1 ? one : many}`;

/** Assigning published lesson versions to classes; reading, changing, moving and deleting assignments. */
export function createAssignmentsService({ db, contexts, now = () => new Date() }: AssignmentsDeps) {
  async function loadVisible(actor: Actor, assignmentId: string): Promise<read.AssignmentView> {
    const view = await read.findAssignmentView(db, actor.active.schoolId, assignmentId);
    if (!view || !canViewAssignment(actor, view)) throw new NotFoundError('That assignment');
    return view;
  }

  async function loadManageable(actor: Actor, assignmentId: string): Promise<read.AssignmentView> {
    const view = await loadVisible(actor, assignmentId);
    if (!canManageAssignment(actor, view)) {
      throw new ForbiddenError('Only the teacher who assigned this lesson, the class’s teacher or an admin can change this assignment.');
    }
    return view;
  }

  async function present(actor: Actor, assignmentId: string): Promise<AssignmentDto> {
    const view = await read.findAssignmentView(db, actor.active.schoolId, assignmentId);
    if (!view) throw new NotFoundError('That assignment');
    return presentAssignment(view, actor, now());
  }

  /** The classes of the request, each a class of the school the caller may assign to. */
  async function assignableClasses(actor: Actor, classIds: string[]): Promise<read.AssignableClass[]> {
    const twice = duplicates(classIds);
    if (twice.length > 0) {
      throw new ValidationError(
        'A class is chosen more than once: choose each class once.',
        twice.map((index) => ({ path: `classIds.${index}`, message: 'This class is already chosen.' })),
      );
    }
    const found = await read.findAssignableClasses(db, actor.active.schoolId, classIds);
    const byId = new Map(found.map((cls) => [cls.id, cls]));
    const missing = classIds.flatMap((id, index) => (byId.has(id) ? [] : [index]));
    if (missing.length > 0) {
      const message = `This is not a class of ${actor.active.schoolName} (or it is archived).`;
      throw new ValidationError(
        missing.length === 1
          ? `classIds.${missing[0]}: ${message}`
          : `${missing.length} of the classes chosen are not classes of ${actor.active.schoolName}.`,
        missing.map((index) => ({ path: `classIds.${index}`, message })),
      );
    }
    const classes = classIds.map((id) => byId.get(id)!);
    if (!actor.active.roles.includes('admin')) {
      const others = classes.filter((cls) => cls.teacherId !== actor.userId);
      if (others.length > 0) {
        const names = others.map((cls) => `“${cls.name}”`).join(', ');
        throw new ForbiddenError(
          `You can assign lessons to your own classes only, and ${names} ${others.length === 1 ? 'is' : 'are'} not yours. An admin can assign to any class.`,
        );
      }
    }
    return classes;
  }

  return {
    /** One assignment per chosen class: a published version of a lesson the caller may open, dates in school time. */
    async create(actor: Actor, input: AssignmentCreate): Promise<AssignmentCreatedDto> {
      const schoolId = actor.active.schoolId;
      const lesson = await loadViewableLesson(db, actor, input.lessonId);
      const facts = await read.findLessonFacts(db, schoolId, lesson.id);
      if (!facts) throw new NotFoundError('That lesson');
      if (facts.archived) throw new ConflictError('lesson_archived', `“${facts.title}” is archived: restore it before assigning it.`);
      const version = await read.findLessonVersion(db, schoolId, lesson.id, input.versionNumber);
      if (!version) {
        const message =
          facts.latestVersion === null
            ? `“${facts.title}” has no published version yet: publish it, then assign it.`
            : `“${facts.title}” has no version ${input.versionNumber}; its newest is version ${facts.latestVersion}.`;
        throw new ValidationError(message, [{ path: 'versionNumber', message }], 'version_not_found');
      }
      const classes = await assignableClasses(actor, input.classIds);
      const settings = settingsOf(input, actor.active.timeZone);
      const ids = await db.transaction(async (trx) => {
        const created = await repo.insertAssignments(trx, {
          schoolId,
          lessonId: lesson.id,
          versionId: version.versionId,
          versionNumber: version.number,
          createdBy: actor.userId,
          classIds: classes.map((cls) => cls.id),
          settings,
        });
        for (const [index, id] of created.entries()) {
          const cls = classes[index]!;
          await recordAudit(trx, {
            schoolId,
            actorId: actor.userId,
            subjectId: null,
            action: 'assignment_created',
            data: auditData(
              { id, lessonId: lesson.id, lessonTitle: facts.title, classId: cls.id, className: cls.name },
              { version: version.number },
            ),
          });
        }
        return created;
      });
      const views = await read.findAssignmentViews(db, schoolId, ids);
      return { assignments: views.map((view) => presentAssignment(view, actor, now())) };
    },

    /** Assignments the caller may see: a teacher's classes and their own, a coordinator's department, an admin's school. */
    async list(actor: Actor, query: AssignmentListQuery): Promise<AssignmentListDto> {
      const views = await read.listAssignmentViews(db, actor, query);
      const at = now();
      return { assignments: views.map((view) => presentAssignment(view, actor, at)) };
    },

    async detail(actor: Actor, assignmentId: string): Promise<AssignmentDto> {
      return presentAssignment(await loadVisible(actor, assignmentId), actor, now());
    },

    /** New dates and policies (the version changes only by a move); students see them at once. */
    async update(actor: Actor, assignmentId: string, input: AssignmentUpdate): Promise<AssignmentDto> {
      const view = await loadManageable(actor, assignmentId);
      const settings = settingsOf(input, actor.active.timeZone);
      await db.transaction(async (trx) => {
        const locked = await repo.lockSettings(trx, view.schoolId, view.id);
        if (!locked) throw new NotFoundError('That assignment');
        await repo.updateSettings(trx, view.schoolId, view.id, settings);
        await recordAudit(trx, {
          schoolId: view.schoolId,
          actorId: actor.userId,
          subjectId: null,
          action: 'assignment_updated',
          data: auditData(view, { changes: settingChanges(locked, settings) }),
        });
      });
      contexts.forget(view.id);
      return present(actor, view.id);
    },

    /** Moves to a corrected version of the same lesson and regrades the changed checkpoints' answers. */
    async move(actor: Actor, assignmentId: string, input: AssignmentMove): Promise<AssignmentMovedDto> {
      const view = await loadManageable(actor, assignmentId);
      const result = await moveAssignment(db, actor, view, input.versionNumber);
      contexts.forget(view.id);
      return { assignment: await present(actor, view.id), ...result };
    },

    /** Deletes an assignment nobody has answered yet; one with answers stays (change its dates instead). */
    async remove(actor: Actor, assignmentId: string): Promise<void> {
      const view = await loadManageable(actor, assignmentId);
      await db.transaction(async (trx) => {
        if (!(await repo.lockAgainstAnswers(trx, view.schoolId, view.id))) throw new NotFoundError('That assignment');
        const recorded = await read.countResponses(trx, view.schoolId, view.id);
        if (recorded.responses > 0) {
          throw new ConflictError(
            'assignment_has_responses',
            `${plural(recorded.responses, 'answer', 'answers')} from ${plural(recorded.students, 'student', 'students')} ${recorded.responses === 1 ? 'is' : 'are'} recorded for this assignment, so it cannot be deleted and nothing was removed. To stop further answers, change its due date instead.`,
          );
        }
        await repo.deleteAssignment(trx, view.schoolId, view.id);
        await recordAudit(trx, {
          schoolId: view.schoolId,
          actorId: actor.userId,
          subjectId: null,
          action: 'assignment_deleted',
          data: auditData(view, { version: view.versionNumber }),
        });
      });
      contexts.forget(view.id);
    },
  };
}

export type AssignmentsService = ReturnType<typeof createAssignmentsService>;
