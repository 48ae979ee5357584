import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { ensurePackages } from './apt';
import { log } from './output';

function canTraverse(user: string, dir: string): boolean {
  return spawnSync('runuser', ['-u', user, '--', 'test', '-x', dir], { cwd: '/' }).status === 0;
}

/** `/a/b/c` -> `/a`, `/a/b`, `/a/b/c`. */
export function ancestors(target: string): string[] {
  const parts = path.resolve(target).split(path.sep).filter(Boolean);
  return parts.map((_, index) => path.sep + parts.slice(0, index + 1).join(path.sep));
}

/**
 * The `postgres` OS user must reach the cluster folder. A clone under /root (mode 700) blocks it:
 * grant that one user passage (ACL `--x`, no listing, nothing for other users) and say so.
 */
export function grantTraversal(target: string, user: string): void {
  // Top down: a folder only counts as blocked once its parent is passable.
  for (const dir of ancestors(target)) {
    if (canTraverse(user, dir)) continue;
    ensurePackages(['acl']);
    const result = spawnSync('setfacl', ['-m', `u:${user}:x`, dir], { encoding: 'utf8' });
    if (result.status !== 0 || !canTraverse(user, dir)) {
      throw new Error(
        `The ${user} OS user (which runs PostgreSQL) cannot enter ${dir}, and granting it with setfacl failed ` +
          `(${(result.stderr ?? '').trim() || 'no ACL support'}). Clone the repository somewhere ${user} can reach ` +
          `(for example /srv or /opt), or run: chmod o+x ${dir}`,
      );
    }
    log(`gave the ${user} OS user passage through ${dir} (setfacl u:${user}:x) so it can reach the cluster folder`);
  }
}
