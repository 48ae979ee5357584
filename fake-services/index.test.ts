import { mkdtemp, rm } from 'node:fs/promises';
import { createServer } from 'node:net';
import type { Server } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakeServices } from './index';
import type { FakeServicesOptions } from './index';

let dataDir = '';
beforeAll(async () => {
  dataDir = await mkdtemp(join(tmpdir(), 'pinfield-fakes-index-'));
});
afterAll(async () => {
  await rm(dataDir, { recursive: true, force: true });
});

function listen(port: number): Promise<Server> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve(server));
  });
}
function close(server: Server): Promise<void> {
  return new Promise((resolve) => server.close(() => resolve()));
}
async function freePort(): Promise<number> {
  const server = await listen(0);
  const address = server.address();
  await close(server);
  if (typeof address !== 'object' || address === null) throw new Error('no port');
  return address.port;
}

function options(ports: FakeServicesOptions['ports']): FakeServicesOptions {
  return {
    dataDir,
    ports,
    oidc: { clientId: 'c', clientSecret: 's', accounts: [] },
    s3: { bucket: 'index-bucket', corsOrigins: ['http://127.0.0.1:4999'] },
  };
}

describe('startFakeServices', () => {
  it('starts all three and closes them', async () => {
    const fakes = await startFakeServices(options({ s3: 0, oidc: 0, smtp: 0, mailWeb: 0 }));
    const inboxPort = Number(new URL(fakes.urls.inbox).port);
    expect((await fetch(`${fakes.urls.inbox}/api/messages`)).status).toBe(200);
    // Up and private: an unsigned request is refused, as by a real bucket that is not public.
    expect((await fetch(`${fakes.urls.s3}/index-bucket`)).status).toBe(403);
    await fakes.close();
    // The port is free again: nothing is left listening.
    await close(await listen(inboxPort));
  });

  it('closes the fakes that did start when another cannot listen', async () => {
    const taken = await listen(0);
    const takenPort = (taken.address() as { port: number }).port;
    const ports = { s3: await freePort(), oidc: takenPort, smtp: await freePort(), mailWeb: await freePort() };
    try {
      await expect(startFakeServices(options(ports))).rejects.toThrow(
        `OIDC fake could not listen on 127.0.0.1:${takenPort}: the address is already in use`,
      );
    } finally {
      await close(taken);
    }
    for (const port of [ports.s3, ports.smtp, ports.mailWeb]) await close(await listen(port));
  });

  it('refuses the same port for two fakes', async () => {
    await expect(startFakeServices(options({ s3: 4999, oidc: 4998, smtp: 4999, mailWeb: 0 }))).rejects.toThrow(
      'ports.s3 and ports.smtp are both 4999',
    );
  });
});
