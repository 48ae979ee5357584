import { z } from 'zod';
import { RoleSchema } from '../roles';
import { EmailSchema, IdSchema, PersonNameSchema } from './common';
import { JoinCodeSchema } from './classes';

export const EmailLinkRequestSchema = z.object({ email: EmailSchema });
export type EmailLinkRequest = z.infer<typeof EmailLinkRequestSchema>;

export const EmailLinkVerifySchema = z.object({
  token: z
    .string({ error: 'The sign-in link is incomplete.' })
    .trim()
    .regex(/^[A-Za-z0-9_-]{32,128}$/, { error: 'The sign-in link is incomplete or damaged: request a new one.' }),
});
export type EmailLinkVerify = z.infer<typeof EmailLinkVerifySchema>;

export const JoinClassRequestSchema = z.object({
  code: JoinCodeSchema,
  email: EmailSchema,
  name: PersonNameSchema,
});
export type JoinClassRequest = z.infer<typeof JoinClassRequestSchema>;

export const CsrfDtoSchema = z.object({ csrfToken: z.string() });
export type CsrfDto = z.infer<typeof CsrfDtoSchema>;

export const MembershipDtoSchema = z.object({
  schoolId: IdSchema,
  schoolName: z.string(),
  timeZone: z.string(),
  locale: z.string(),
  roles: z.array(RoleSchema),
});
export type MembershipDto = z.infer<typeof MembershipDtoSchema>;

export const MeDtoSchema = z.object({
  user: z.object({ id: IdSchema, email: z.string(), name: z.string() }),
  memberships: z.array(MembershipDtoSchema),
  active: z.object({ schoolId: IdSchema, role: RoleSchema }),
  csrfToken: z.string(),
});
export type MeDto = z.infer<typeof MeDtoSchema>;

export const SetActiveSchema = z.object({ schoolId: IdSchema, role: RoleSchema });
export type SetActive = z.infer<typeof SetActiveSchema>;

/** Public facts the signed-out pages need (no secrets). */
export const AuthConfigDtoSchema = z.object({
  demoMode: z.boolean(),
  demoAccounts: z.array(z.object({ email: z.string(), name: z.string(), label: z.string() })),
});
export type AuthConfigDto = z.infer<typeof AuthConfigDtoSchema>;

/** Codes the sign-in callback puts in `/signin?error=` so the page can explain what happened. */
export const SIGN_IN_ERRORS = {
  unknown_account:
    'We could not sign you in with that account. Ask your school admin for an invitation, or use the e-mail your school knows.',
  unverified_email:
    'That account’s e-mail address is not verified with the provider, so it cannot be linked. Verify it there, or sign in with an e-mail link.',
  cancelled: 'Sign-in was cancelled.',
  provider_error: 'The sign-in provider did not answer as expected. Try again in a moment.',
  no_membership: 'Your account is not a member of any school any more. Ask your school admin.',
} as const;
export type SignInErrorCode = keyof typeof SIGN_IN_ERRORS;
