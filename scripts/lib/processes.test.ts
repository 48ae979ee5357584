import { readFileSync } from 'node:fs';
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { describe, expect, it } from 'vitest';
import { groupAlive, startChild, Supervisor, waitForHttp } from './processes';

const node = process.execPath;

/** Alive and not a zombie waiting to be reaped. */
function isLive(pid: number): boolean {
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    return !['Z', 'X'].includes(stat.slice(stat.lastIndexOf(')') + 2, stat.lastIndexOf(')') + 3));
  } catch {
    return false;
  }
}
const spec = (name: string, code: string) => ({
  name,
  command: node,
  args: ['-e', code],
  cwd: process.cwd(),
  env: process.env,
  echo: false,
});

// A child that starts a grandchild in its group, says so, and ignores SIGTERM only if asked.
const parentWithGrandchild = `
  const { spawn } = require('node:child_process');
  const grandchild = spawn(process.execPath, ['-e', 'setInterval(() => {}, 1000)'], { stdio: 'ignore' });
  console.log('ready grandchild=' + grandchild.pid);
  setInterval(() => {}, 1000);
`;

describe('startChild', () => {
  it('waits for a line, then stops the whole process group', async () => {
    const child = startChild(spec('family', parentWithGrandchild));
    const line = await child.waitForLine(/^ready grandchild=\d+$/, 10_000);
    const grandchild = Number(line.split('=')[1]);
    expect(groupAlive(child.pid)).toBe(true);
    await child.stop();
    expect(groupAlive(child.pid)).toBe(false);
    expect(isLive(grandchild)).toBe(false);
  });

  it('kills a child that ignores SIGTERM after the grace period', async () => {
    const child = startChild(spec('stubborn', "process.on('SIGTERM', () => {}); console.log('up'); setInterval(() => {}, 1000);"));
    await child.waitForLine(/^up$/, 10_000);
    await child.stop(300);
    expect((await child.exited).signal).toBe('SIGKILL');
  });

  it('rejects waitForLine when the child exits first, keeping its last lines', async () => {
    const child = startChild(spec('failing', "console.error('PORT: expected a port number'); process.exit(3);"));
    await expect(child.waitForLine(/^never$/, 10_000)).rejects.toThrow('failing exited (exit code 3) before it was ready');
    expect(child.tail()).toContain('PORT: expected a port number');
  });
});

describe('waitForHttp', () => {
  it('resolves once the URL answers 200', async () => {
    const server = createServer((_req, res) => res.end('ok')).listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    const { port } = server.address() as AddressInfo;
    await expect(waitForHttp(`http://127.0.0.1:${port}/`, 5000)).resolves.toBeUndefined();
    server.close();
  });

  it('rejects as soon as the watched child exits', async () => {
    const child = startChild(spec('early-exit', 'process.exit(1)'));
    await expect(waitForHttp('http://127.0.0.1:9/never', 60_000, child)).rejects.toThrow('early-exit exited (exit code 1)');
  });
});

describe('Supervisor', () => {
  it('runs clean-up steps once, last registered first', async () => {
    const order: string[] = [];
    const supervisor = new Supervisor();
    supervisor.defer('stop database', async () => void order.push('database'));
    supervisor.defer('stop app', async () => void order.push('app'));
    await Promise.all([supervisor.stopAll(), supervisor.stopAll()]);
    expect(order).toEqual(['app', 'database']);
  });

  it('runs a step registered while stopping at once', async () => {
    const supervisor = new Supervisor();
    await supervisor.stopAll();
    const ran = new Promise<string>((resolve) => supervisor.defer('late', async () => resolve('ran')));
    await expect(ran).resolves.toBe('ran');
  });
});
