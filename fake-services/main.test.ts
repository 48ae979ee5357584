import { spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFakeEnv } from './fake-env';

let dataDir = '';
beforeAll(async () => {
  dataDir = await mkdtemp(join(tmpdir(), 'pinfield-fakes-main-'));
});
afterAll(async () => {
  await rm(dataDir, { recursive: true, force: true });
});

const FREE_PORTS = { FAKE_S3_PORT: '0', FAKE_OIDC_PORT: '0', FAKE_SMTP_PORT: '0', FAKE_MAIL_WEB_PORT: '0' };

function runMain(env: Record<string, string>) {
  const child = spawn(process.execPath, ['--import', 'tsx', join(import.meta.dirname, 'main.ts')], {
    env: { ...process.env, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let stdout = '';
  let stderr = '';
  child.stdout.on('data', (chunk: Buffer) => (stdout += chunk.toString()));
  child.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
  const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
  const ready = new Promise<Record<string, string>>((resolve, reject) => {
    child.stdout.on('data', () => {
      const line = /^fakes ready (.+)$/m.exec(stdout)?.[1];
      if (line) resolve(JSON.parse(line) as Record<string, string>);
    });
    void exited.then((code) => reject(new Error(`exited with ${code}: ${stderr}`)));
  });
  // A run expected to fail never becomes ready; that rejection is read through `exited` instead.
  void ready.catch(() => undefined);
  return { child, ready, exited, output: () => ({ stdout, stderr }) };
}

// Starting a tsx child process can be slow on a busy two-core machine.
describe('fake services CLI', { timeout: 30_000 }, () => {
  it('prints "fakes ready" with the URLs, serves them, and exits 0 on SIGTERM', async () => {
    const run = runMain({ ...FREE_PORTS, FAKE_DATA_DIR: dataDir, FAKE_S3_BUCKET: 'cli-bucket' });
    const urls = await run.ready;
    expect(Object.keys(urls).sort()).toEqual(['inbox', 'oidc', 's3', 'smtp']);
    expect(urls['smtp']).toMatch(/^smtp:\/\/127\.0\.0\.1:\d+$/);
    expect((await fetch(`${urls['inbox']}/api/messages`)).status).toBe(200);
    expect((await fetch(`${urls['oidc']}/.well-known/openid-configuration`)).status).toBe(200);
    expect(existsSync(join(dataDir, 's3', 'cli-bucket'))).toBe(true);
    run.child.kill('SIGTERM');
    expect(await run.exited).toBe(0);
  });

  it('exits 1 and names the variable when a value is bad', async () => {
    const run = runMain({ ...FREE_PORTS, FAKE_DATA_DIR: dataDir, FAKE_OIDC_PORT: 'forty' });
    expect(await run.exited).toBe(1);
    expect(run.output().stderr).toContain('FAKE_OIDC_PORT must be a port number from 0 to 65535');
    expect(run.output().stdout).not.toContain('fakes ready');
  });
});

describe('readFakeEnv', () => {
  it('uses the npm start defaults', () => {
    const result = readFakeEnv({});
    expect(result.ok && result.options.ports).toEqual({ s3: 4312, oidc: 4313, smtp: 4314, mailWeb: 4315 });
    expect(result.ok && result.options.s3).toEqual({ bucket: 'pinfield-media', corsOrigins: ['http://127.0.0.1:4310'] });
  });

  it('reads accounts and origins, and names each bad field', () => {
    const good = readFakeEnv({
      FAKE_OIDC_ACCOUNTS: '[{"email":"ada@fernhollow.example","name":"Ada Quill","label":"Teacher"}]',
      FAKE_S3_CORS_ORIGINS: 'http://127.0.0.1:4310, http://localhost:4310',
    });
    expect(good.ok && good.options.oidc.accounts).toEqual([{ email: 'ada@fernhollow.example', name: 'Ada Quill', label: 'Teacher' }]);
    expect(good.ok && good.options.s3.corsOrigins).toEqual(['http://127.0.0.1:4310', 'http://localhost:4310']);

    const bad = readFakeEnv({
      FAKE_OIDC_ACCOUNTS: '[{"email":"ada","name":"Ada"}]',
      FAKE_S3_CORS_ORIGINS: 'http://127.0.0.1:4310/app',
      FAKE_SMTP_PORT: '70000',
      FAKE_OIDC_CLIENT_SECRET: ' ',
    });
    expect(bad.ok ? [] : bad.problems).toEqual([
      'FAKE_SMTP_PORT must be a port number from 0 to 65535 (0 picks a free one)',
      'FAKE_OIDC_CLIENT_SECRET must not be empty',
      'FAKE_OIDC_ACCOUNTS[0].email must be an e-mail address',
      'FAKE_OIDC_ACCOUNTS[0].label is required',
      'FAKE_S3_CORS_ORIGINS[0] each entry must be an origin such as http://127.0.0.1:4310 (scheme, host, optional port; no path)',
    ]);
    const notJson = readFakeEnv({ FAKE_OIDC_ACCOUNTS: '{oops' });
    expect(notJson.ok ? [] : notJson.problems).toEqual([
      'FAKE_OIDC_ACCOUNTS must be JSON: an array of { "email", "name", "label" } objects',
    ]);
  });
});
