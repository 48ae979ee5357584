import { readdir, rm, stat } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';

/** Every attempt works in a folder with this prefix under the OS temp folder. */
export const TEMP_PREFIX = 'pinfield-job-';

/**
 * An attempt removes its folder when it ends; a worker that was killed cannot. At start, folders
 * older than `olderThanMs` are removed: pg-boss has expired their job by then, so none is in use.
 */
export async function removeStaleTempFolders(olderThanMs: number, root = tmpdir()): Promise<number> {
  const cutoff = Date.now() - olderThanMs;
  let removed = 0;
  for (const name of await readdir(root)) {
    if (!name.startsWith(TEMP_PREFIX)) continue;
    const folder = path.join(root, name);
    const info = await stat(folder).catch(() => null);
    if (info?.isDirectory() && info.mtimeMs < cutoff) {
      await rm(folder, { recursive: true, force: true });
      removed++;
    }
  }
  return removed;
}
