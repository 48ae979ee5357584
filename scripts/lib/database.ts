import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { isOurProcess } from './leftovers';
import { ensureCluster, ensureRoleAndDatabases, startCluster, stopCluster, type Cluster } from './postgres';
import { log } from './output';
import { HOST } from './ports';
import type { Supervisor } from './processes';
import { root } from './paths';

/**
 * Creates (first time) and starts the project cluster, then the `pinfield` role and databases.
 * The run that started the server stops it at the end (fast shutdown). A server found running is
 * left alone while the run that started it is alive (`npm run dev` beside `npm run db:seed`), and
 * adopted when that run is gone (it was killed without a chance to clean up).
 */
export async function prepareCluster(
  supervisor: Supervisor,
  options: { dir: string; port: number; throwaway: boolean; databases: string[]; runDir: string },
): Promise<Cluster> {
  const cluster = ensureCluster(options.dir, options.port, { throwaway: options.throwaway });
  const ownerFile = path.join(options.runDir, 'postgres-owner.json');
  const started = startCluster(cluster);
  if (started || !ownerAlive(ownerFile)) {
    mkdirSync(options.runDir, { recursive: true });
    writeFileSync(ownerFile, JSON.stringify({ pid: process.pid }));
    supervisor.defer('stop PostgreSQL', async () => {
      stopCluster(cluster, 'fast');
      rmSync(ownerFile, { force: true });
      log(`PostgreSQL on port ${cluster.port} stopped (fast shutdown)`);
    });
    log(
      started
        ? `PostgreSQL started on ${HOST}:${cluster.port} (data ${options.dir})`
        : `PostgreSQL on ${HOST}:${cluster.port} was left running by an earlier run: taking it over`,
    );
  } else {
    log(`PostgreSQL already running on ${HOST}:${cluster.port} for another Pinfield command: using it and leaving it running`);
  }
  await ensureRoleAndDatabases(cluster, options.databases);
  return cluster;
}

function ownerAlive(ownerFile: string): boolean {
  if (!existsSync(ownerFile)) return false;
  try {
    const { pid } = JSON.parse(readFileSync(ownerFile, 'utf8')) as { pid: number };
    return pid !== process.pid && isOurProcess(pid, root);
  } catch {
    return false;
  }
}

/** Whether a database URL points at the project cluster of this port (and not another server). */
export function targetsLocalCluster(databaseUrl: string, port: number): { local: boolean; database: string } {
  const url = new URL(databaseUrl);
  const local = ['127.0.0.1', 'localhost'].includes(url.hostname) && Number(url.port || 5432) === port;
  return { local, database: decodeURIComponent(url.pathname.replace(/^\//, '')) || 'pinfield' };
}
