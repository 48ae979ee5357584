import type { Knex } from 'knex';
import type { Logger } from 'pino';
import type { EmailLinkRequest, JoinClassRequest } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { AppError } from '../../errors';
import type { Mailer } from '../../mail/mailer';
import { joinLinkMail, signInLinkMail } from '../../mail/templates';
import type { SignInLimits } from '../../middleware/rate-limit';
import { recordAudit } from '../audit/audit.repository';
import { findClassByJoinCode, insertEnrolments } from '../classes/classes.repository';
import * as repo from './auth.repository';
import { hashToken, newToken } from './tokens';

export const NEUTRAL_LINK_NOTICE =
  'If that address belongs to a Pinfield account, a sign-in link is on its way. It works once, for 15 minutes.';
export const NEUTRAL_JOIN_NOTICE =
  'If that code and address can join a class, a link to confirm is on its way to the address. It works once, for 15 minutes.';

export class SignInRefused extends Error {
  constructor(readonly reason: 'unknown_account' | 'unverified_email' | 'no_membership') {
    super(reason);
  }
}

interface Deps {
  db: Knex;
  mailer: Mailer;
  limits: SignInLimits;
  publicUrl: string;
  logger: Logger;
}

export interface GoogleProfile {
  sub: string;
  email?: string;
  emailVerified: boolean;
}

/** Sign-in by e-mail link and by an OpenID Connect account, and students joining by class code. */
export function createAuthService({ db, mailer, limits, publicUrl, logger }: Deps) {
  const expiresAt = () => new Date(Date.now() + LIMITS.signInLinkMinutes * 60_000);

  // Sent after the response is decided, so the answer takes the same time whether or not an account exists.
  function sendLater(message: Parameters<Mailer['send']>[0]): void {
    mailer.send(message).catch((error: unknown) => logger.error({ err: error, to: message.to }, 'sign-in mail failed'));
  }

  return {
    /** Sends a one-time link to a known member; the reply never says whether the address is known. */
    async requestEmailLink({ email }: EmailLinkRequest, address: string): Promise<string> {
      await limits.consume(email, address);
      const userId = await repo.findUserIdByEmail(db, email);
      if (userId && (await repo.hasMembership(db, userId))) {
        const { token, tokenHash } = newToken();
        await repo.insertToken(db, { tokenHash, purpose: 'sign_in', email, userId, expiresAt: expiresAt() });
        sendLater(signInLinkMail(email, `${publicUrl}/signin/link?token=${token}`, LIMITS.signInLinkMinutes));
      }
      return NEUTRAL_LINK_NOTICE;
    },

    /** A class code plus an address on the school's list of domains earns a join link. */
    async requestJoin({ code, email, name }: JoinClassRequest, address: string): Promise<string> {
      await limits.consume(email, address);
      const found = await findClassByJoinCode(db, code);
      const domain = email.split('@')[1] ?? '';
      if (found && found.emailDomains.includes(domain)) {
        const { token, tokenHash } = newToken();
        await repo.insertToken(db, { tokenHash, purpose: 'join', email, name, classId: found.id, expiresAt: expiresAt() });
        sendLater(joinLinkMail(email, `${publicUrl}/signin/link?token=${token}`, found.name, found.schoolName, LIMITS.signInLinkMinutes));
      }
      return NEUTRAL_JOIN_NOTICE;
    },

    /** Uses up a link and returns whom it signs in; a join link also creates the student and enrols them. */
    async redeemLink(token: string): Promise<{ userId: string; schoolId?: string }> {
      return db.transaction(async (trx) => {
        const row = await repo.claimToken(trx, hashToken(token));
        if (!row) {
          throw new AppError(400, 'link_invalid', 'This sign-in link has expired or was already used. Ask for a new one below.');
        }
        if (row.purpose === 'sign_in' && row.userId) return { userId: row.userId };
        return joinClass(trx, row);
      });
    },

    /** Resolves an OpenID Connect account to a user; links it on first use when the provider verified the e-mail. */
    async resolveGoogle(profile: GoogleProfile): Promise<string> {
      const linked = await repo.findIdentityUser(db, 'google', profile.sub);
      if (linked) return linked;
      const email = profile.email?.trim().toLowerCase();
      if (!email) throw new SignInRefused('unknown_account');
      const userId = await repo.findUserIdByEmail(db, email);
      if (!userId) throw new SignInRefused('unknown_account');
      if (!profile.emailVerified) throw new SignInRefused('unverified_email');
      await repo.insertIdentity(db, { userId, provider: 'google', subject: profile.sub, email });
      return userId;
    },

    /** Everything a successful sign-in changes in the database; the session is handled by the route. */
    async recordSignIn(userId: string, method: 'google' | 'email_link', ip: string): Promise<void> {
      if (!(await repo.hasMembership(db, userId))) throw new SignInRefused('no_membership');
      await db.transaction(async (trx) => {
        await repo.activateMemberships(trx, userId);
        await repo.touchSignIn(trx, userId);
        await recordAudit(trx, { schoolId: null, actorId: userId, subjectId: userId, action: 'sign_in', data: { method }, ip });
      });
    },
  };
}

async function joinClass(trx: Knex.Transaction, row: repo.TokenRow): Promise<{ userId: string; schoolId: string }> {
  const cls = row.classId ? await trx('classes').where({ id: row.classId }).whereNull('archived_at').first('id', 'school_id') : undefined;
  if (!cls) throw new AppError(400, 'link_invalid', 'The class this link was for no longer exists. Ask your teacher for its new code.');
  let userId = await repo.findUserIdByEmail(trx, row.email);
  if (!userId) {
    const [created] = await trx('users')
      .insert({ email: row.email, name: row.name ?? row.email })
      .returning('id');
    userId = (created as { id: string }).id;
  }
  const membership = await trx('memberships').where({ user_id: userId, school_id: cls.school_id }).first('id', 'roles');
  if (!membership) {
    await trx('memberships').insert({ user_id: userId, school_id: cls.school_id, roles: ['student'], status: 'active' });
  } else if (!membership.roles.includes('student')) {
    throw new AppError(400, 'link_invalid', 'This address is a staff account at that school, so it cannot join a class as a student.');
  }
  await insertEnrolments(trx, cls.id, [userId]);
  await recordAudit(trx, {
    schoolId: cls.school_id,
    actorId: userId,
    subjectId: userId,
    action: 'joined_class',
    data: { classId: cls.id },
  });
  return { userId, schoolId: cls.school_id };
}

export type AuthService = ReturnType<typeof createAuthService>;
