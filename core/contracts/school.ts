import { z } from 'zod';
import { IdSchema } from './common';

const DomainSchema = z
  .string()
  .trim()
  .toLowerCase()
  .regex(/^(?=.{1,253}$)([a-z0-9]([a-z0-9-]{0,61}[a-z0-9])?\.)+[a-z]{2,63}$/, {
    error: 'Enter a domain like school.example, without @ or https://.',
  });

export const SchoolDtoSchema = z.object({
  id: IdSchema,
  name: z.string(),
  timeZone: z.string(),
  locale: z.string(),
  emailDomains: z.array(z.string()),
});
export type SchoolDto = z.infer<typeof SchoolDtoSchema>;

export const SchoolUpdateSchema = z.object({
  emailDomains: z.array(DomainSchema).max(20, { error: 'At most 20 domains.' }).optional(),
});
export type SchoolUpdate = z.infer<typeof SchoolUpdateSchema>;
