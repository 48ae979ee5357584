import { z } from 'zod';
import { LIMITS } from '../limits';
import { IdSchema } from './common';

export const JoinCodeSchema = z
  .string({ error: 'Enter the class code.' })
  .trim()
  .toUpperCase()
  .regex(/^[A-Z0-9]{8}$/, { error: 'A class code has 8 letters and digits, like K7QM2XPA.' });

/** A class as its teacher, coordinator or admin sees it. */
export const ClassDtoSchema = z.object({
  id: IdSchema,
  name: z.string(),
  joinCode: z.string(),
  departmentId: IdSchema.nullable(),
  departmentName: z.string().nullable(),
  teacher: z.object({ id: IdSchema, name: z.string(), email: z.string() }).nullable(),
  studentCount: z.number().int(),
  createdAt: z.string(),
});
export type ClassDto = z.infer<typeof ClassDtoSchema>;

/** A class as one of its students sees it: no join code, no roster. */
export const StudentClassDtoSchema = z.object({
  id: IdSchema,
  name: z.string(),
  departmentName: z.string().nullable(),
  teacherName: z.string().nullable(),
  enrolledAt: z.string(),
});
export type StudentClassDto = z.infer<typeof StudentClassDtoSchema>;

export const StudentJoinSchema = z.object({ code: JoinCodeSchema });
export type StudentJoin = z.infer<typeof StudentJoinSchema>;

export const ClassCreateSchema = z.object({
  name: z
    .string({ error: 'Enter a class name.' })
    .trim()
    .min(1, { error: 'Enter a class name.' })
    .max(LIMITS.classNameMax, { error: `A class name has at most ${LIMITS.classNameMax} characters.` }),
  departmentId: IdSchema.nullable(),
  teacherId: IdSchema.nullable(),
});
export type ClassCreate = z.infer<typeof ClassCreateSchema>;

export const EnrolSchema = z.object({
  userIds: z.array(IdSchema).min(1, { error: 'Choose at least one student.' }).max(LIMITS.rosterRowsMax),
});
export type Enrol = z.infer<typeof EnrolSchema>;

export const ClassMemberDtoSchema = z.object({ userId: IdSchema, name: z.string(), email: z.string(), enrolledAt: z.string() });
export type ClassMemberDto = z.infer<typeof ClassMemberDtoSchema>;

export const ClassDetailDtoSchema = ClassDtoSchema.extend({ students: z.array(ClassMemberDtoSchema) });
export type ClassDetailDto = z.infer<typeof ClassDetailDtoSchema>;

export const ClassListDtoSchema = z.object({ classes: z.array(ClassDtoSchema) });
export type ClassListDto = z.infer<typeof ClassListDtoSchema>;

export const StudentClassListDtoSchema = z.object({ classes: z.array(StudentClassDtoSchema) });
export type StudentClassListDto = z.infer<typeof StudentClassListDtoSchema>;
