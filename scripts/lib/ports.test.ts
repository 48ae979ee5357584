import { createServer } from 'node:net';
import { describe, expect, it } from 'vitest';
import { assertPortFree, portsOf, profiles } from './ports';

describe('port profiles', () => {
  it('never share a port, so npm test runs beside npm start', () => {
    const all = [...portsOf(profiles.start), ...portsOf(profiles.test)];
    expect(new Set(all).size).toBe(all.length);
  });

  it('keep the brief’s numbers', () => {
    expect(profiles.start).toMatchObject({ app: 4310, postgres: 4311, s3: 4312, oidc: 4313, smtp: 4314, mailWeb: 4315 });
    expect(profiles.test).toMatchObject({ app: 4320, postgres: 4321, s3: 4322, oidc: 4323, smtp: 4324, mailWeb: 4325, cdp: 4326 });
  });
});

describe('assertPortFree', () => {
  it('names a port that is taken and the hint', async () => {
    const server = createServer().listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    const address = server.address();
    const port = typeof address === 'object' && address ? address.port : 0;
    await expect(assertPortFree(port, 'the app', 'Stop the other one.')).rejects.toThrow(
      `Port ${port} on 127.0.0.1 (the app) is already in use. Stop the other one.`,
    );
    server.close();
    await new Promise((resolve) => server.once('close', resolve));
    await expect(assertPortFree(port, 'the app', '')).resolves.toBeUndefined();
  });
});
