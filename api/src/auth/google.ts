import { Passport } from 'passport';
import { Strategy as GoogleStrategy, type Profile } from 'passport-google-oauth20';
import type { Env } from '../env';
import type { GoogleProfile } from '../features/auth/auth.service';

/** A passport instance with the Google strategy, its endpoints taken from the environment (the local fake by default). */
export type PassportInstance = InstanceType<typeof Passport>;

export function createPassport(env: Env): PassportInstance {
  const passport = new Passport();
  passport.use(
    'google',
    new GoogleStrategy(
      {
        clientID: env.GOOGLE_CLIENT_ID,
        clientSecret: env.GOOGLE_CLIENT_SECRET,
        callbackURL: `${env.PUBLIC_URL}/api/auth/google/callback`,
        authorizationURL: env.GOOGLE_AUTHORIZATION_URL,
        tokenURL: env.GOOGLE_TOKEN_URL,
        userProfileURL: env.GOOGLE_USERINFO_URL,
        state: true,
        pkce: true,
        scope: ['openid', 'email', 'profile'],
      },
      (_accessToken: string, _refreshToken: string, profile: Profile, done: (error: unknown, user?: GoogleProfile) => void) => {
        const claims = profile._json as { sub?: string; email?: string; email_verified?: boolean | string };
        done(null, {
          sub: claims.sub ?? profile.id,
          email: claims.email ?? profile.emails?.[0]?.value,
          emailVerified: claims.email_verified === true || claims.email_verified === 'true',
        });
      },
    ),
  );
  return passport;
}
