import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { envSchema, loadEnv, productionRequired } from '../api/src/env';

// Docker cannot run on these machines: the compose file is checked as data instead.
const root = path.resolve(import.meta.dirname, '..');
const compose = parse(readFileSync(path.join(root, 'docker-compose.yml'), 'utf8')) as {
  services: Record<string, { image?: string; build?: unknown; environment?: Record<string, unknown> | string[] }>;
};

/** Compose accepts `environment` as a map or as a list of `NAME=value`. */
function environmentOf(service: string): Record<string, string> {
  const env = compose.services[service]?.environment ?? {};
  if (Array.isArray(env)) {
    return Object.fromEntries(env.map((entry) => [entry.split('=')[0] ?? '', entry.split('=').slice(1).join('=')]));
  }
  return Object.fromEntries(Object.entries(env).map(([key, value]) => [key, value === null ? '' : String(value)]));
}

/** Compose's `${NAME}`, `${NAME:-default}` and `${NAME:?message}` with the given shell values. */
function interpolate(text: string, shell: Record<string, string>): string {
  return text.replace(/\$\{([A-Z0-9_]+)(?::?([-?])([^}]*))?\}/g, (_match, name: string, kind?: string, rest?: string) => {
    const value = shell[name];
    if (value !== undefined && value !== '') return value;
    if (kind === '-') return rest ?? '';
    if (kind === '?') throw new Error(`${name}: ${rest ?? 'required'}`);
    return '';
  });
}

// What an operator would put in the shell or .env (invented values, reserved .example domains).
const operator = {
  POSTGRES_PASSWORD: 'db-password-for-the-test',
  PUBLIC_URL: 'https://pinfield.fernhollow.example',
  SESSION_SECRET: 'a-session-secret-that-is-long-enough-0123456789',
  GOOGLE_CLIENT_ID: 'client-id-from-the-console',
  GOOGLE_CLIENT_SECRET: 'client-secret-from-the-console',
  S3_ENDPOINT: 'https://media.fernhollow.example',
  S3_ACCESS_KEY_ID: 'store-access-key',
  S3_SECRET_ACCESS_KEY: 'store-secret-key',
  MAIL_FROM: 'Pinfield <no-reply@fernhollow.example>',
};

describe('docker-compose.yml', () => {
  const app = environmentOf('app');

  it('gives every service an image or a build', () => {
    const services = Object.entries(compose.services);
    expect(services.map(([name]) => name)).toEqual(expect.arrayContaining(['db', 'app', 'storage', 'mail']));
    for (const [name, service] of services) {
      expect({ name, hasImageOrBuild: Boolean(service.image) || service.build !== undefined }).toEqual({ name, hasImageOrBuild: true });
    }
    expect(compose.services.db?.image).toBe('postgres:15');
  });

  it.each(productionRequired)('sets %s for the app service', (name) => {
    expect(app[name] ?? '').not.toBe('');
  });

  it('sets only variables the app knows (a typo would be silently ignored)', () => {
    const known = new Set(Object.keys(envSchema.shape));
    expect(Object.keys(app).filter((name) => !known.has(name))).toEqual([]);
  });

  it('keeps secrets out of the file: they are required placeholders', () => {
    for (const name of ['SESSION_SECRET', 'GOOGLE_CLIENT_SECRET', 'S3_SECRET_ACCESS_KEY']) {
      expect(app[name]).toMatch(new RegExp(`^\\$\\{${name}:\\?`));
    }
    expect(app.DATABASE_URL).toContain('${POSTGRES_PASSWORD:?');
  });

  it('passes the app’s production checks once the operator sets the placeholders', () => {
    const resolved = Object.fromEntries(Object.entries(app).map(([key, value]) => [key, interpolate(value, operator)]));
    const env = loadEnv(resolved);
    expect(env.NODE_ENV).toBe('production');
    expect(env.DEMO_MODE).toBe(false);
    expect(env.DATABASE_URL).toBe('postgres://pinfield:db-password-for-the-test@db:5432/pinfield');
  });

  it('refuses to start when a required secret is missing', () => {
    const { SESSION_SECRET: _omitted, ...withoutSecret } = operator;
    expect(() => interpolate(app.SESSION_SECRET ?? '', withoutSecret)).toThrow(/^SESSION_SECRET: set SESSION_SECRET/);
  });
});
