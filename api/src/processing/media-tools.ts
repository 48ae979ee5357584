import { spawn } from 'node:child_process';
import { createInterface } from 'node:readline';
import { resolve } from 'node:path';
import ffmpeg, { type FfmpegCommand } from 'fluent-ffmpeg';

/** Two cores on the target machine: ffmpeg runs niced and small, so the API keeps a core. */
export const FFMPEG_THREADS = 2;

export interface ToolRunOptions {
  /** Niceness 0-19 (`nice -n`). */
  nice: number;
  signal?: AbortSignal;
}

/** ffmpeg or ffprobe exited with an error; `stderr` holds its last lines. */
export class ToolError extends Error {
  override readonly name = 'ToolError';

  constructor(
    readonly tool: string,
    message: string,
    readonly stderr: string,
    /** Set when a signal ended the tool (a shutdown, the OOM killer): that says nothing about the file. */
    readonly killedBy: string | null = null,
  ) {
    super(`${tool}: ${message}`);
  }
}

/**
 * A path as an ffmpeg URL: `file:` stops a name like `clip:1.mp4` being read as a protocol.
 * With `pattern`, `%` in the folder is escaped because image2 reads `%03d` from the whole name.
 */
export function mediaUrl(path: string, pattern?: string): string {
  const full = resolve(path);
  return pattern === undefined ? `file:${full}` : `file:${full.replaceAll('%', '%%')}/${pattern}`;
}

/** `{ '-c:v': 'libx264', '-an': true }` -> ['-c:v', 'libx264', '-an']: option lists that stay readable. */
export function flags(options: Record<string, string | number | true>): string[] {
  return Object.entries(options).flatMap(([name, value]) => (value === true ? [name] : [name, String(value)]));
}

const STDERR_KEEP = 64 * 1024;

/**
 * Runs ffprobe/ffmpeg as `nice -n <nice> <tool> ...args` (an argument list, never a shell string).
 * With `onLine`, stdout is streamed line by line instead of collected. An abort kills the process
 * and rejects with the signal's reason.
 */
export function runTool(
  tool: 'ffprobe' | 'ffmpeg',
  args: string[],
  options: ToolRunOptions & { onLine?: (line: string) => void },
): Promise<{ stdout: string; stderr: string }> {
  const { signal } = options;
  if (signal?.aborted) return Promise.reject(signal.reason);
  return new Promise((resolvePromise, reject) => {
    const child = spawn('nice', ['-n', String(options.nice), tool, ...args], { stdio: ['ignore', 'pipe', 'pipe'] });
    let stdout = '';
    let stderr = '';
    const onAbort = (): void => {
      child.kill('SIGKILL');
    };
    signal?.addEventListener('abort', onAbort, { once: true });
    if (options.onLine) {
      const onLine = options.onLine;
      createInterface({ input: child.stdout }).on('line', (line) => onLine(line));
    } else {
      child.stdout.setEncoding('utf8').on('data', (chunk: string) => (stdout += chunk));
    }
    child.stderr.setEncoding('utf8').on('data', (chunk: string) => {
      stderr = (stderr + chunk).slice(-STDERR_KEEP);
    });
    child.on('error', (error) => {
      signal?.removeEventListener('abort', onAbort);
      reject(new ToolError(tool, `could not start (${error.message}); is ffmpeg installed?`, stderr));
    });
    child.on('close', (code, killedBy) => {
      signal?.removeEventListener('abort', onAbort);
      if (signal?.aborted) reject(signal.reason);
      else if (code === 0) resolvePromise({ stdout, stderr });
      else reject(new ToolError(tool, killedBy ? `killed by ${killedBy}` : `exited with code ${code}`, stderr, killedBy));
    });
  });
}

export interface FfmpegRunOptions extends ToolRunOptions {
  /** Media time the run covers, to turn ffmpeg's `time=` into a fraction 0-1. */
  durationSeconds?: number;
  onProgress?: (fraction: number) => void;
  onStderrLine?: (line: string) => void;
}

/**
 * Runs one fluent-ffmpeg command under `nice` (its `niceness` option spawns `nice -n N ffmpeg`).
 * Progress comes from ffmpeg's own status lines: a fluent 'progress' listener would start an
 * extra, un-niced ffprobe of the input.
 */
export function runFfmpeg(configure: (command: FfmpegCommand) => void, options: FfmpegRunOptions): Promise<void> {
  const { signal } = options;
  if (signal?.aborted) return Promise.reject(signal.reason);
  const command = ffmpeg({ niceness: options.nice, stdoutLines: 200 });
  configure(command);
  // Global options, placed with the (single) input: never read stdin, always overwrite our own outputs.
  command.inputOptions(['-nostdin', '-hide_banner', '-y']);
  return new Promise((resolvePromise, reject) => {
    let started = false;
    const onAbort = (): void => {
      // Before the spawn there is no process yet: 'start' kills it as soon as it exists.
      if (started) command.kill('SIGKILL');
    };
    signal?.addEventListener('abort', onAbort, { once: true });
    command.on('start', () => {
      started = true;
      if (signal?.aborted) command.kill('SIGKILL');
    });
    command.on('stderr', (line: string) => {
      options.onStderrLine?.(line);
      const time = /time=(-?\d+):(\d\d):(\d\d(?:\.\d+)?)/.exec(line);
      if (time && options.onProgress && options.durationSeconds && options.durationSeconds > 0) {
        const seconds = Number(time[1]) * 3600 + Number(time[2]) * 60 + Number(time[3]);
        options.onProgress(Math.min(1, Math.max(0, seconds / options.durationSeconds)));
      }
    });
    command.on('error', (error: Error, _stdout: string | null, stderr: string | null) => {
      signal?.removeEventListener('abort', onAbort);
      if (signal?.aborted) reject(signal.reason);
      else reject(new ToolError('ffmpeg', error.message, stderr ?? '', /killed with signal (\w+)/.exec(error.message)?.[1] ?? null));
    });
    command.on('end', () => {
      signal?.removeEventListener('abort', onAbort);
      if (signal?.aborted) reject(signal.reason);
      else resolvePromise();
    });
    command.run();
  });
}

/**
 * Start-up check: the installed ffmpeg's version, e.g. "5.1.9-0+deb12u1". Throws a plain sentence
 * when ffmpeg or ffprobe is missing or has no H.264 encoder (libx264), which the rendition needs.
 */
export async function ffmpegVersion(): Promise<string> {
  const run = (tool: 'ffmpeg' | 'ffprobe', args: string[]) =>
    runTool(tool, args, { nice: 0 }).catch((error: unknown) => {
      throw new Error(
        `${tool} is not usable (${error instanceof Error ? error.message : String(error)}); install Debian's ffmpeg package.`,
      );
    });
  const [{ stdout }] = await Promise.all([run('ffmpeg', ['-version']), run('ffprobe', ['-version'])]);
  const version = /^ffmpeg version (\S+)/m.exec(stdout)?.[1];
  if (!version) throw new Error('ffmpeg -version printed no version line.');
  const { stdout: encoders } = await run('ffmpeg', ['-hide_banner', '-encoders']);
  if (!/\blibx264\b/.test(encoders)) throw new Error(`ffmpeg ${version} has no libx264 encoder; the web rendition needs it.`);
  return version;
}
