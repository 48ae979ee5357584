import { z } from 'zod';
import { LIMITS } from '../limits';
import { IdSchema } from './common';
import { ClassDtoSchema } from './classes';

export const DepartmentCreateSchema = z.object({
  name: z
    .string({ error: 'Enter a department name.' })
    .trim()
    .min(1, { error: 'Enter a department name.' })
    .max(LIMITS.departmentNameMax, { error: `A department name has at most ${LIMITS.departmentNameMax} characters.` }),
});
export type DepartmentCreate = z.infer<typeof DepartmentCreateSchema>;

export const DepartmentDtoSchema = z.object({
  id: IdSchema,
  name: z.string(),
  classCount: z.number().int(),
  memberCount: z.number().int(),
});
export type DepartmentDto = z.infer<typeof DepartmentDtoSchema>;

const StaffSchema = z.object({ id: IdSchema, name: z.string(), email: z.string(), roles: z.array(z.string()) });

/** What a coordinator (or a substitute) sees of a department. */
export const DepartmentOverviewDtoSchema = z.object({
  id: IdSchema,
  name: z.string(),
  staff: z.array(StaffSchema),
  classes: z.array(ClassDtoSchema.omit({ joinCode: true })),
});
export type DepartmentOverviewDto = z.infer<typeof DepartmentOverviewDtoSchema>;

export const DepartmentListDtoSchema = z.object({ departments: z.array(DepartmentDtoSchema) });
export type DepartmentListDto = z.infer<typeof DepartmentListDtoSchema>;

export const DepartmentOverviewListDtoSchema = z.object({ departments: z.array(DepartmentOverviewDtoSchema) });
export type DepartmentOverviewListDto = z.infer<typeof DepartmentOverviewListDtoSchema>;
