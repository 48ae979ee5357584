import type { Knex } from 'knex';
import type { DepartmentCreate, DepartmentDto, DepartmentOverviewDto } from '@core/contracts';
import type { Actor } from '../../auth/actor';
import { ConflictError } from '../../errors';
import { listClasses } from '../classes/classes.read-model';
import { listDepartmentStaff, listDepartments } from './departments.read-model';

/** Departments of a school, and the overview a coordinator or substitute reads. */
export function createDepartmentsService(db: Knex) {
  return {
    list: (actor: Actor): Promise<DepartmentDto[]> => listDepartments(db, actor.active.schoolId),

    async create(actor: Actor, input: DepartmentCreate): Promise<DepartmentDto> {
      const schoolId = actor.active.schoolId;
      const clash = await db('departments').where({ school_id: schoolId }).whereRaw('lower(name) = lower(?)', [input.name]).first('id');
      if (clash) throw new ConflictError('department_exists', `There is already a department called “${input.name}”.`);
      const [row] = await db('departments').insert({ school_id: schoolId, name: input.name }).returning(['id', 'name']);
      return { ...(row as { id: string; name: string }), classCount: 0, memberCount: 0 };
    },

    /** The caller's own department; one with no department set sees every department of the school. */
    async overview(actor: Actor): Promise<DepartmentOverviewDto[]> {
      const schoolId = actor.active.schoolId;
      const all = await listDepartments(db, schoolId);
      const mine = actor.active.departmentId ? all.filter((d) => d.id === actor.active.departmentId) : all;
      const ids = mine.map((d) => d.id);
      const [staff, classes] = await Promise.all([
        listDepartmentStaff(db, schoolId, ids),
        listClasses(db, { schoolId, departmentIds: ids }),
      ]);
      return mine.map((department) => ({
        id: department.id,
        name: department.name,
        staff: staff.filter((s) => s.departmentId === department.id).map(({ departmentId: _, ...person }) => person),
        classes: classes.filter((c) => c.departmentId === department.id).map(({ joinCode: _, ...cls }) => cls),
      }));
    },
  };
}

export type DepartmentsService = ReturnType<typeof createDepartmentsService>;
