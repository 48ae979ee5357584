import path from 'node:path';
import { appDatabaseUrl } from './postgres';
import { HOST, type PortProfile } from './ports';

export type Env = Record<string, string>;

/**
 * The app's environment for a port profile: every address points at this profile's own cluster
 * and fakes. Values not listed here keep the defaults of api/src/env.ts.
 */
export function profileAppEnv(ports: PortProfile, options: { root: string; database: string }): Env {
  const origin = `http://${HOST}:${ports.app}`;
  const oidc = `http://${HOST}:${ports.oidc}`;
  return {
    NODE_ENV: 'development',
    HOST,
    PORT: String(ports.app),
    PUBLIC_URL: origin,
    DATABASE_URL: appDatabaseUrl(ports.postgres, options.database),
    GOOGLE_CLIENT_ID: 'pinfield-local',
    GOOGLE_CLIENT_SECRET: 'pinfield-local-secret',
    GOOGLE_AUTHORIZATION_URL: `${oidc}/authorize`,
    GOOGLE_TOKEN_URL: `${oidc}/token`,
    GOOGLE_USERINFO_URL: `${oidc}/userinfo`,
    S3_ENDPOINT: `http://${HOST}:${ports.s3}`,
    S3_REGION: 'us-east-1',
    S3_BUCKET: 'pinfield-media',
    S3_ACCESS_KEY_ID: 'S3RVER',
    S3_SECRET_ACCESS_KEY: 'S3RVER',
    SMTP_URL: `smtp://${HOST}:${ports.smtp}`,
    DEMO_MODE: 'true',
    WEB_DIST: path.join(options.root, 'web', 'dist'),
    AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
  };
}

/**
 * `npm start`/`dev`: a variable set in the user's environment wins over the profile. When only
 * HOST or PORT is overridden, PUBLIC_URL follows them so the printed address stays right.
 */
export function withUserOverrides(profile: Env, user: NodeJS.ProcessEnv): Env {
  const merged: Env = { ...profile };
  for (const key of Object.keys(profile)) {
    const value = user[key];
    if (value !== undefined && value !== '') merged[key] = value;
  }
  const movedAddress = ['HOST', 'PORT'].some((key) => user[key] !== undefined && user[key] !== '');
  // A non-numeric PORT is left for the app's own check to name; it must not break PUBLIC_URL too.
  const portOk = /^\d{1,5}$/.test(merged.PORT ?? '');
  if (movedAddress && portOk && (user.PUBLIC_URL ?? '') === '') merged.PUBLIC_URL = `http://${merged.HOST}:${merged.PORT}`;
  return merged;
}

/** The child environment: the inherited one plus the app's variables on top. */
export function childEnv(app: Env, extra: Env = {}): NodeJS.ProcessEnv {
  return { ...process.env, ...app, ...extra };
}
