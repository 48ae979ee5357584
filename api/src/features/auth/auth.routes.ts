import { Router, type Request, type Response, type NextFunction } from 'express';
import type { PassportInstance } from '../../auth/google';
import type { CsrfSync } from 'csrf-sync';
import {
  EmailLinkRequestSchema,
  EmailLinkVerifySchema,
  JoinClassRequestSchema,
  type AuthConfigDto,
  type SignInErrorCode,
} from '@core/contracts';
import { publicAccess, signedIn } from '../../middleware/access';
import { bodyOf, validateBody } from '../../middleware/validate';
import { destroySession, regenerate, saveSession, SESSION_COOKIE } from '../../auth/session';
import { findActorData } from '../../auth/actor.repository';
import { chooseActive } from '../../auth/actor';
import { presentMe } from '../me/me.presenter';
import { SignInRefused, type AuthService, type GoogleProfile } from './auth.service';
import { recordAudit } from '../audit/audit.repository';
import type { Knex } from 'knex';

interface Deps {
  db: Knex;
  auth: AuthService;
  passport: PassportInstance;
  csrf: CsrfSync;
  config: AuthConfigDto;
}

export function authRoutes({ db, auth, passport, csrf, config }: Deps): Router {
  const router = Router();

  /** Swaps the session for a fresh one that carries the signed-in person. */
  async function startSession(req: Request, userId: string, schoolId?: string): Promise<void> {
    await regenerate(req);
    req.session.userId = userId;
    if (schoolId) req.session.activeSchoolId = schoolId;
    await saveSession(req);
  }

  router.get('/config', publicAccess(), (_req, res) => {
    res.json(config);
  });

  router.get('/csrf', publicAccess(), (req, res) => {
    res.json({ csrfToken: csrf.generateToken(req) });
  });

  router.post('/email-link', publicAccess(), validateBody(EmailLinkRequestSchema), async (req, res) => {
    const message = await auth.requestEmailLink(bodyOf(req, EmailLinkRequestSchema), req.ip ?? 'unknown');
    res.status(202).json({ message });
  });

  router.post('/join', publicAccess(), validateBody(JoinClassRequestSchema), async (req, res) => {
    const message = await auth.requestJoin(bodyOf(req, JoinClassRequestSchema), req.ip ?? 'unknown');
    res.status(202).json({ message });
  });

  router.post('/email-link/verify', publicAccess(), validateBody(EmailLinkVerifySchema), async (req, res) => {
    const { userId, schoolId } = await auth.redeemLink(bodyOf(req, EmailLinkVerifySchema).token);
    await auth.recordSignIn(userId, 'email_link', req.ip ?? 'unknown');
    await startSession(req, userId, schoolId);
    const data = (await findActorData(db, userId))!;
    const active = chooseActive(data.memberships, { schoolId })!;
    res.json(
      presentMe(
        { userId, email: data.user.email, name: data.user.name, memberships: data.memberships, active },
        csrf.generateToken(req, true),
      ),
    );
  });

  router.get('/google', publicAccess(), passport.authenticate('google', { session: false, prompt: 'select_account' }));

  router.get('/google/callback', publicAccess(), (req: Request, res: Response, next: NextFunction) => {
    const fail = (code: SignInErrorCode) => res.redirect(`/signin?error=${code}`);
    if (req.query.error) return fail(req.query.error === 'access_denied' ? 'cancelled' : 'provider_error');
    // Without a code passport would start a new sign-in instead of finishing this one.
    if (typeof req.query.code !== 'string') return fail('provider_error');
    passport.authenticate('google', { session: false }, async (error: unknown, profile: GoogleProfile | false) => {
      try {
        if (error || !profile) return fail('provider_error');
        const userId = await auth.resolveGoogle(profile);
        await auth.recordSignIn(userId, 'google', req.ip ?? 'unknown');
        await startSession(req, userId);
        res.redirect('/');
      } catch (caught) {
        if (!(caught instanceof SignInRefused)) return next(caught);
        await recordAudit(db, {
          schoolId: null,
          actorId: null,
          subjectId: null,
          action: 'sign_in_refused',
          data: { reason: caught.reason, email: profile ? profile.email : null },
          ip: req.ip,
        });
        fail(caught.reason);
      }
    })(req, res, next);
  });

  router.post('/sign-out', signedIn(), async (req, res) => {
    await recordAudit(db, {
      schoolId: req.actor!.active.schoolId,
      actorId: req.actor!.userId,
      subjectId: req.actor!.userId,
      action: 'sign_out',
      ip: req.ip,
    });
    await destroySession(req);
    res.clearCookie(SESSION_COOKIE);
    res.status(204).end();
  });

  return router;
}
