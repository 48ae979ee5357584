import { spawn } from 'node:child_process';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { createInterface } from 'node:readline';
import { setTimeout as sleep } from 'node:timers/promises';
import { log, paint } from './output';

export interface ChildSpec {
  name: string;
  command: string;
  args: string[];
  cwd: string;
  env: NodeJS.ProcessEnv;
  /** Echo the child's output with a `[name]` prefix (default true). */
  echo?: boolean;
  /** Share our stdout/stderr as they are (keeps colours and progress bars; no line capture). */
  inherit?: boolean;
}

export interface ChildExit {
  code: number | null;
  signal: NodeJS.Signals | null;
}

export interface ManagedChild {
  readonly name: string;
  readonly pid: number;
  /** Settles when the direct child has exited. */
  readonly exited: Promise<ChildExit>;
  /** Whether the direct child has exited. */
  hasExited(): boolean;
  /** The last lines the child printed (stdout and stderr), for error messages. */
  tail(): string[];
  /** Resolves with the first line matching `pattern`; rejects if the child exits first or on timeout. */
  waitForLine(pattern: RegExp, timeoutMs: number): Promise<string>;
  /** SIGTERM to the whole process group, SIGKILL after `graceMs`; resolves when no member is left. */
  stop(graceMs?: number): Promise<void>;
}

const TAIL_LINES = 60;

/**
 * Spawns a child in its own process group (so a terminal Ctrl-C reaches only us and we stop
 * children in order) with its output prefixed line by line.
 */
export function startChild(spec: ChildSpec): ManagedChild {
  const child = spawn(spec.command, spec.args, {
    cwd: spec.cwd,
    env: spec.env,
    detached: true,
    stdio: spec.inherit ? ['ignore', 'inherit', 'inherit'] : ['ignore', 'pipe', 'pipe'],
  });
  if (child.pid === undefined) {
    throw new Error(`Could not start ${spec.name}: ${spec.command} ${spec.args.join(' ')}`);
  }
  const pid = child.pid;
  const recent: string[] = [];
  const listeners = new Set<(line: string) => void>();
  let exitInfo: ChildExit | null = null;
  const prefix = paint('dim', `[${spec.name}]`);

  const onLine = (line: string): void => {
    recent.push(line);
    if (recent.length > TAIL_LINES) recent.shift();
    if (spec.echo !== false) process.stdout.write(`${prefix} ${line}\n`);
    for (const listener of listeners) listener(line);
  };
  let openStreams = 2;
  const streamsClosed = new Promise<void>((resolve) => {
    if (!child.stdout || !child.stderr) return resolve();
    for (const stream of [child.stdout, child.stderr]) {
      const rl = createInterface({ input: stream });
      rl.on('line', onLine);
      rl.on('close', () => {
        openStreams -= 1;
        if (openStreams === 0) resolve();
      });
    }
  });

  const exited = new Promise<ChildExit>((resolve) => {
    child.on('error', (error) => {
      onLine(`failed to start: ${error.message}`);
      exitInfo = { code: 127, signal: null };
      resolve(exitInfo);
    });
    child.on('exit', (code, signal) => {
      exitInfo = { code, signal };
      // Wait for the last output lines so error messages are complete.
      void Promise.race([streamsClosed, sleep(1000)]).then(() => resolve({ code, signal }));
    });
  });

  const waitForLine = (pattern: RegExp, timeoutMs: number): Promise<string> =>
    new Promise<string>((resolve, reject) => {
      const found = recent.find((line) => pattern.test(line));
      if (found !== undefined) return resolve(found);
      const timer = setTimeout(() => {
        cleanup();
        reject(new Error(`${spec.name} did not print ${String(pattern)} within ${timeoutMs / 1000} s`));
      }, timeoutMs);
      const listener = (line: string): void => {
        if (!pattern.test(line)) return;
        cleanup();
        resolve(line);
      };
      const cleanup = (): void => {
        clearTimeout(timer);
        listeners.delete(listener);
      };
      listeners.add(listener);
      void exited.then((info) => {
        cleanup();
        reject(new Error(`${spec.name} exited (${describeExit(info)}) before it was ready`));
      });
    });

  const stop = async (graceMs = 10_000): Promise<void> => {
    signalGroup(pid, 'SIGTERM');
    const deadline = Date.now() + graceMs;
    while (Date.now() < deadline && groupAlive(pid)) await sleep(50);
    if (groupAlive(pid)) {
      log(`${spec.name} did not stop within ${graceMs / 1000} s: killing it`);
      signalGroup(pid, 'SIGKILL');
      const killDeadline = Date.now() + 5000;
      while (Date.now() < killDeadline && groupAlive(pid)) await sleep(50);
    }
    await exited;
  };

  return {
    name: spec.name,
    pid,
    exited,
    hasExited: () => exitInfo !== null,
    tail: () => [...recent],
    waitForLine,
    stop,
  };
}

export function describeExit(info: ChildExit): string {
  return info.signal ? `signal ${info.signal}` : `exit code ${info.code ?? 'unknown'}`;
}

function signalGroup(pgid: number, signal: NodeJS.Signals): void {
  try {
    process.kill(-pgid, signal);
  } catch {
    // The group is already gone.
  }
}

/**
 * True while a live (non-zombie) process of the group exists. Zombies do not count: they are
 * dead, and pid 1 of a container may take its time to reap them.
 */
export function groupAlive(pgid: number): boolean {
  if (!existsSync('/proc/self/stat')) {
    try {
      process.kill(-pgid, 0);
      return true;
    } catch {
      return false;
    }
  }
  for (const entry of readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    let stat: string;
    try {
      stat = readFileSync(`/proc/${entry}/stat`, 'utf8');
    } catch {
      continue; // exited while we looked
    }
    // "pid (comm) state ppid pgrp ...": comm may contain spaces and parentheses.
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    if (Number(fields[2]) === pgid && fields[0] !== 'Z' && fields[0] !== 'X') return true;
  }
  return false;
}

/**
 * Polls `url` until it answers 200. Rejects early when `child` exits, so a start-up failure
 * (a bad environment variable, say) is reported at once instead of after the timeout.
 */
export async function waitForHttp(url: string, timeoutMs: number, child?: ManagedChild): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  let last = 'no answer yet';
  while (Date.now() < deadline) {
    if (child?.hasExited()) {
      const info = await child.exited;
      throw new ChildExitedError(child, info);
    }
    try {
      const response = await fetch(url, { signal: AbortSignal.timeout(2000) });
      await response.arrayBuffer();
      if (response.status === 200) return;
      last = `status ${response.status}`;
    } catch (error) {
      last = error instanceof Error ? error.message : String(error);
    }
    await sleep(200);
  }
  throw new Error(`${url} did not answer 200 within ${timeoutMs / 1000} s (last: ${last})`);
}

export class ChildExitedError extends Error {
  constructor(
    readonly child: ManagedChild,
    readonly info: ChildExit,
  ) {
    super(`${child.name} exited (${describeExit(info)}) before it was ready`);
    this.name = 'ChildExitedError';
  }
}

type Cleanup = () => Promise<void>;

/**
 * Runs clean-up steps in reverse order of registration, once, on SIGINT/SIGTERM or on request.
 * A second signal while stopping is ignored: npm and the terminal may both deliver the same Ctrl-C.
 */
export class Supervisor {
  private readonly steps: { label: string; run: Cleanup }[] = [];
  private stopping: Promise<void> | null = null;

  /** Registers a clean-up step; the last registered runs first. Once stopping, it runs at once. */
  defer(label: string, run: Cleanup): void {
    if (this.stopping) {
      void run().catch((error: unknown) => log(`could not ${label}: ${String(error)}`));
      return;
    }
    this.steps.push({ label, run });
  }

  /** Stops a child as part of the clean-up. */
  own(child: ManagedChild): ManagedChild {
    this.defer(`stop ${child.name}`, () => child.stop());
    return child;
  }

  /**
   * On SIGINT/SIGTERM/SIGHUP, or when our parent process is gone (npm killed on its own passes
   * nothing on): run `onStop` (default: stop everything and exit 0).
   */
  handleSignals(onStop?: (reason: string) => Promise<void>): void {
    const stop = (reason: string): void => {
      if (this.stopping) return;
      log(`${reason}: stopping`);
      void (onStop ?? (async () => this.exit(0)))(reason);
    };
    for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP'] as const) process.on(signal, () => stop(`${signal} received`));
    const parent = process.ppid;
    setInterval(() => {
      if (process.ppid !== parent) stop('the process that started this one is gone');
    }, 1000).unref();
  }

  get isStopping(): boolean {
    return this.stopping !== null;
  }

  /** Runs every clean-up step (errors are reported, not thrown). Idempotent. */
  stopAll(): Promise<void> {
    this.stopping ??= (async () => {
      for (const step of [...this.steps].reverse()) {
        try {
          await step.run();
        } catch (error) {
          log(paint('red', `could not ${step.label}: ${error instanceof Error ? error.message : String(error)}`));
        }
      }
      this.steps.length = 0;
    })();
    return this.stopping;
  }

  async exit(code: number): Promise<never> {
    await this.stopAll();
    process.exit(code);
  }
}
