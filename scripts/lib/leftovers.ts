import { existsSync, mkdirSync, readdirSync, readFileSync, readlinkSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { log } from './output';
import { groupAlive, type ManagedChild } from './processes';

interface ChildRecord {
  name: string;
  pid: number;
}

/**
 * Children are recorded in `<dataDir>/run/` while they run. If a run was killed with SIGKILL
 * (no chance to clean up), the next run stops what it left behind before taking the ports.
 */
export function recordChild(runDir: string, child: ManagedChild): void {
  mkdirSync(runDir, { recursive: true });
  const file = path.join(runDir, `${child.name}.json`);
  writeFileSync(file, JSON.stringify({ name: child.name, pid: child.pid } satisfies ChildRecord));
  void child.exited.then(() => rmSync(file, { force: true }));
}

/** A recorded pid counts only if it still runs from this repository (pids get reused). */
export function isOurProcess(pid: number, root: string): boolean {
  try {
    return readlinkSync(`/proc/${pid}/cwd`) === root;
  } catch {
    return false;
  }
}

export async function stopLeftoverChildren(runDir: string, root: string): Promise<void> {
  if (!existsSync(runDir)) return;
  for (const entry of readdirSync(runDir).filter((name) => name.endsWith('.json'))) {
    const file = path.join(runDir, entry);
    let record: ChildRecord | null = null;
    try {
      record = JSON.parse(readFileSync(file, 'utf8')) as ChildRecord;
    } catch {
      // A half-written record: nothing to stop.
    }
    if (record && Number.isInteger(record.pid) && isOurProcess(record.pid, root) && groupAlive(record.pid)) {
      log(`stopping ${record.name} (pid ${record.pid}) left running by an earlier run`);
      process.kill(-record.pid, 'SIGTERM');
      for (let i = 0; i < 100 && groupAlive(record.pid); i += 1) await sleep(50);
      if (groupAlive(record.pid)) process.kill(-record.pid, 'SIGKILL');
    }
    rmSync(file, { force: true });
  }
}
