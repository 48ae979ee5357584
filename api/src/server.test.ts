import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';

function startServer(env: Record<string, string>) {
  return spawnSync(process.execPath, ['--import', 'tsx', 'api/src/server.ts'], {
    env: { PATH: process.env.PATH ?? '', ...env },
    encoding: 'utf8',
    timeout: 30_000,
  });
}

describe('starting the server', () => {
  it('stops with the name of a bad variable', () => {
    const result = startServer({ PORT: 'not-a-port' });
    expect(result.status).toBe(1);
    expect(result.stderr).toContain('PORT: expected a port number');
  });

  it('refuses production without its secrets', () => {
    const result = startServer({ NODE_ENV: 'production' });
    expect(result.status).toBe(1);
    expect(result.stderr).toContain('SESSION_SECRET must be set in production');
    expect(result.stderr).toContain('GOOGLE_CLIENT_SECRET must be set in production');
  });
});
