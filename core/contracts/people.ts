import { z } from 'zod';
import { LIMITS } from '../limits';
import { RoleSchema } from '../roles';
import { EmailSchema, IdSchema, PersonNameSchema } from './common';

const RolesSchema = z
  .array(RoleSchema, { error: 'Choose at least one role.' })
  .min(1, { error: 'Choose at least one role.' })
  .transform((roles) => [...new Set(roles)]);

export const PeopleQuerySchema = z.object({
  q: z
    .string()
    .trim()
    .max(LIMITS.searchMax, { error: `Search text has at most ${LIMITS.searchMax} characters.` })
    .optional(),
  role: RoleSchema.optional(),
  page: z.coerce.number({ error: 'page must be a whole number.' }).int().min(1).default(1),
  pageSize: z.coerce.number({ error: 'pageSize must be a whole number.' }).int().min(1).max(LIMITS.pageSizeMax).default(25),
});
export type PeopleQuery = z.infer<typeof PeopleQuerySchema>;

export const PersonDtoSchema = z.object({
  userId: IdSchema,
  email: z.string(),
  name: z.string(),
  roles: z.array(RoleSchema),
  status: z.enum(['invited', 'active']),
  departmentId: IdSchema.nullable(),
  departmentName: z.string().nullable(),
  classNames: z.array(z.string()),
  lastSignInAt: z.string().nullable(),
  abilities: z.object({ changeRoles: z.boolean() }),
});
export type PersonDto = z.infer<typeof PersonDtoSchema>;

export const PeoplePageDtoSchema = z.object({
  people: z.array(PersonDtoSchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});
export type PeoplePageDto = z.infer<typeof PeoplePageDtoSchema>;

export const InvitationCreateSchema = z.object({
  email: EmailSchema,
  name: PersonNameSchema,
  roles: RolesSchema,
  departmentId: IdSchema.nullable().optional(),
  classId: IdSchema.nullable().optional(),
});
export type InvitationCreate = z.infer<typeof InvitationCreateSchema>;

/** PATCH: undefined leaves a field alone, null clears it. */
export const PersonUpdateSchema = z
  .object({ roles: RolesSchema.optional(), departmentId: IdSchema.nullable().optional() })
  .refine((body) => body.roles !== undefined || body.departmentId !== undefined, {
    error: 'Send roles or departmentId to change.',
  });
export type PersonUpdate = z.infer<typeof PersonUpdateSchema>;

export const RosterUploadSchema = z.object({
  csv: z
    .string({ error: 'Paste or upload a CSV file.' })
    .min(1, { error: 'The CSV file is empty.' })
    .max(LIMITS.rosterBytesMax, { error: `A roster file is at most ${LIMITS.rosterBytesMax / 1024} KB.` }),
});
export type RosterUpload = z.infer<typeof RosterUploadSchema>;

export const RosterRowDtoSchema = z.object({
  line: z.number().int(),
  email: z.string(),
  name: z.string(),
  roles: z.array(z.string()),
  className: z.string().nullable(),
  errors: z.array(z.string()),
  existing: z.boolean(),
});
export type RosterRowDto = z.infer<typeof RosterRowDtoSchema>;

export const RosterPreviewDtoSchema = z.object({
  rows: z.array(RosterRowDtoSchema),
  errors: z.array(z.string()),
  valid: z.boolean(),
});
export type RosterPreviewDto = z.infer<typeof RosterPreviewDtoSchema>;

export const RosterImportDtoSchema = z.object({ invited: z.number().int(), enrolled: z.number().int() });
export type RosterImportDto = z.infer<typeof RosterImportDtoSchema>;

/** The columns a roster CSV has, in the header row. */
export const ROSTER_COLUMNS = ['email', 'name', 'roles', 'class'] as const;
