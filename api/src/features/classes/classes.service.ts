import type { Knex } from 'knex';
import type { ClassCreate, ClassDetailDto, ClassDto, StudentClassDto } from '@core/contracts';
import type { Actor } from '../../auth/actor';
import { ForbiddenError, NotFoundError, ValidationError } from '../../errors';
import { recordAudit } from '../audit/audit.repository';
import * as repo from './classes.repository';
import * as read from './classes.read-model';
import { canManageEnrolments, canViewClass } from './classes.policy';
import { newJoinCode } from './join-code';

const UNIQUE_VIOLATION = '23505';

/** Classes, their rosters and joining by code. */
export function createClassesService(db: Knex) {
  async function loadVisible(
    actor: Actor,
    classId: string,
    allowed: (actor: Actor, cls: repo.ClassRow) => boolean,
  ): Promise<repo.ClassRow> {
    const cls = await repo.findClass(db, actor.active.schoolId, classId);
    if (!cls) throw new NotFoundError('That class');
    if (!allowed(actor, cls))
      throw new ForbiddenError('Only the class’s teacher, its department’s coordinator or an admin can open this class.');
    return cls;
  }

  async function detail(actor: Actor, cls: repo.ClassRow): Promise<ClassDetailDto> {
    const [summary] = await read.listClasses(db, { schoolId: actor.active.schoolId, classId: cls.id });
    return { ...summary!, students: await read.listClassStudents(db, cls.id) };
  }

  return {
    listForTeacher: (actor: Actor): Promise<ClassDto[]> =>
      read.listClasses(db, { schoolId: actor.active.schoolId, teacherId: actor.userId }),

    listForSchool: (actor: Actor): Promise<ClassDto[]> => read.listClasses(db, { schoolId: actor.active.schoolId }),

    listForStudent: (actor: Actor): Promise<StudentClassDto[]> => read.listStudentClasses(db, actor.active.schoolId, actor.userId),

    async getDetail(actor: Actor, classId: string): Promise<ClassDetailDto> {
      return detail(actor, await loadVisible(actor, classId, canViewClass));
    },

    async create(actor: Actor, input: ClassCreate): Promise<ClassDto> {
      const schoolId = actor.active.schoolId;
      if (input.departmentId && !(await db('departments').where({ id: input.departmentId, school_id: schoolId }).first('id'))) {
        throw new ValidationError('That department is not in this school.', [
          { path: 'departmentId', message: 'Choose a department of this school.' },
        ]);
      }
      if (input.teacherId && (await repo.usersWithRole(db, schoolId, [input.teacherId], 'teacher')).length === 0) {
        throw new ValidationError('That person is not a teacher in this school.', [
          { path: 'teacherId', message: 'Choose a teacher of this school.' },
        ]);
      }
      // A clash of random codes is rare; try again rather than fail the teacher.
      for (let attempt = 0; ; attempt++) {
        try {
          const created = await repo.insertClass(db, {
            schoolId,
            departmentId: input.departmentId,
            teacherId: input.teacherId,
            name: input.name,
            joinCode: newJoinCode(),
          });
          const [dto] = await read.listClasses(db, { schoolId, classId: created.id });
          return dto!;
        } catch (error) {
          if ((error as { code?: string }).code !== UNIQUE_VIOLATION || attempt >= 4) throw error;
        }
      }
    },

    async enrol(actor: Actor, classId: string, userIds: string[]): Promise<ClassDetailDto> {
      const cls = await loadVisible(actor, classId, canManageEnrolments);
      const students = await repo.usersWithRole(db, actor.active.schoolId, userIds, 'student');
      const missing = userIds.filter((id) => !students.includes(id));
      if (missing.length > 0) {
        throw new ValidationError(
          `${missing.length} of the people chosen are not students of this school.`,
          missing.map((id) => ({ path: 'userIds', message: `${id} is not a student of this school.` })),
        );
      }
      await repo.insertEnrolments(db, cls.id, students);
      return detail(actor, cls);
    },

    async unenrol(actor: Actor, classId: string, studentId: string): Promise<void> {
      const cls = await loadVisible(actor, classId, canManageEnrolments);
      if ((await repo.deleteEnrolment(db, cls.id, studentId)) === 0) throw new NotFoundError('That student in this class');
    },

    /** A signed-in student joins a class of their active school by its code. */
    async joinByCode(actor: Actor, code: string): Promise<StudentClassDto> {
      const found = await repo.findClassByJoinCode(db, code);
      if (!found || found.schoolId !== actor.active.schoolId) {
        throw new NotFoundError(`A class with code ${code} in ${actor.active.schoolName}`);
      }
      await repo.insertEnrolments(db, found.id, [actor.userId]);
      await recordAudit(db, {
        schoolId: found.schoolId,
        actorId: actor.userId,
        subjectId: actor.userId,
        action: 'joined_class',
        data: { classId: found.id },
      });
      const classes = await read.listStudentClasses(db, actor.active.schoolId, actor.userId);
      return classes.find((c) => c.id === found.id)!;
    },
  };
}

export type ClassesService = ReturnType<typeof createClassesService>;
