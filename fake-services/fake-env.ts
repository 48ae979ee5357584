import { resolve } from 'node:path';
import { z } from 'zod';
import type { FakeServicesOptions } from './index';

const port = (fallback: string) =>
  z
    .string()
    .default(fallback)
    .refine((value) => /^\d{1,5}$/.test(value) && Number(value) <= 65535, 'must be a port number from 0 to 65535 (0 picks a free one)')
    .transform(Number);

const nonEmpty = (fallback: string) => z.string().trim().min(1, 'must not be empty').default(fallback);

const text = z.string({ error: (issue) => (issue.input === undefined ? 'is required' : 'must be a string') });
const accountSchema = z.object(
  {
    email: text.pipe(z.email('must be an e-mail address')),
    name: text.trim().min(1, 'must not be empty'),
    label: text.trim().min(1, 'must not be empty (say the role, e.g. "Teacher")'),
  },
  { error: 'must be an object with "email", "name" and "label"' },
);

const accountsSchema = z
  .string()
  .default('[]')
  .transform((text, ctx) => {
    try {
      return JSON.parse(text) as unknown;
    } catch {
      ctx.addIssue({ code: 'custom', message: 'must be JSON: an array of { "email", "name", "label" } objects' });
      return z.NEVER;
    }
  })
  .pipe(
    z.array(accountSchema).refine((accounts) => new Set(accounts.map((a) => a.email.toLowerCase())).size === accounts.length, {
      message: 'lists the same e-mail address twice',
    }),
  );

const originsSchema = z
  .string()
  .default('http://127.0.0.1:4310')
  .transform((text) =>
    text
      .split(',')
      .map((origin) => origin.trim())
      .filter((origin) => origin.length > 0),
  )
  .pipe(
    z
      .array(
        z.string().refine((origin) => {
          try {
            return new URL(origin).origin === origin;
          } catch {
            return false;
          }
        }, 'each entry must be an origin such as http://127.0.0.1:4310 (scheme, host, optional port; no path)'),
      )
      .min(1, 'must list at least one origin'),
  );

/** The fakes' environment variables; the defaults are the `npm start` ports and names. */
export const fakeEnvSchema = z.object({
  FAKE_HOST: nonEmpty('127.0.0.1'),
  FAKE_DATA_DIR: nonEmpty('.data/local'),
  FAKE_S3_PORT: port('4312'),
  FAKE_OIDC_PORT: port('4313'),
  FAKE_SMTP_PORT: port('4314'),
  FAKE_MAIL_WEB_PORT: port('4315'),
  FAKE_OIDC_CLIENT_ID: nonEmpty('pinfield-local'),
  FAKE_OIDC_CLIENT_SECRET: nonEmpty('pinfield-local-secret'),
  FAKE_OIDC_ACCOUNTS: accountsSchema,
  FAKE_S3_BUCKET: nonEmpty('pinfield-media'),
  FAKE_S3_CORS_ORIGINS: originsSchema,
});

export type FakeEnvResult = { ok: true; options: FakeServicesOptions } | { ok: false; problems: string[] };

function issuePath(path: PropertyKey[]): string {
  return path.map((part, index) => (typeof part === 'number' ? `[${part}]` : index === 0 ? String(part) : `.${String(part)}`)).join('');
}

/** Reads the fakes' options from environment variables; each problem names its variable. */
export function readFakeEnv(env: Record<string, string | undefined>): FakeEnvResult {
  const parsed = fakeEnvSchema.safeParse(env);
  if (!parsed.success) {
    return { ok: false, problems: parsed.error.issues.map((issue) => `${issuePath(issue.path)} ${issue.message}`) };
  }
  const e = parsed.data;
  return {
    ok: true,
    options: {
      host: e.FAKE_HOST,
      dataDir: resolve(e.FAKE_DATA_DIR),
      ports: { s3: e.FAKE_S3_PORT, oidc: e.FAKE_OIDC_PORT, smtp: e.FAKE_SMTP_PORT, mailWeb: e.FAKE_MAIL_WEB_PORT },
      oidc: { clientId: e.FAKE_OIDC_CLIENT_ID, clientSecret: e.FAKE_OIDC_CLIENT_SECRET, accounts: e.FAKE_OIDC_ACCOUNTS },
      s3: { bucket: e.FAKE_S3_BUCKET, corsOrigins: e.FAKE_S3_CORS_ORIGINS },
    },
  };
}
