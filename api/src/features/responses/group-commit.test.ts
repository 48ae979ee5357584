import { describe, expect, it } from 'vitest';
import { createGroupCommit, type Settled } from './group-commit';

/** A writer whose batches finish only when told to, recording what each batch held. */
function controlledWriter(options: { lanes: number; maxBatch: number }) {
  const batches: string[][] = [];
  const release: (() => void)[] = [];
  const writer = createGroupCommit<string, string>({
    ...options,
    laneKey: (item) => item.split(':')[0]!,
    run: (items) => {
      batches.push(items);
      return new Promise<Settled<string>[]>((resolve) => {
        release.push(() =>
          resolve(items.map((item) => (item.endsWith('!') ? { ok: false, error: new Error(item) } : { ok: true, value: `done ${item}` }))),
        );
      });
    },
  });
  return { writer, batches, release };
}

const tick = () => new Promise((resolve) => setImmediate(resolve));

describe('group commit', () => {
  it('writes a lone item at once and groups what arrives while a batch is in flight, in arrival order', async () => {
    const { writer, batches, release } = controlledWriter({ lanes: 1, maxBatch: 10 });
    const first = writer.submit('a:1');
    await tick();
    expect(batches).toEqual([['a:1']]);
    const later = ['a:2', 'b:1', 'a:3'].map((item) => writer.submit(item));
    await tick();
    expect(batches).toHaveLength(1);
    release.shift()!();
    expect(await first).toBe('done a:1');
    await tick();
    expect(batches[1]).toEqual(['a:2', 'b:1', 'a:3']);
    release.shift()!();
    expect(await Promise.all(later)).toEqual(['done a:2', 'done b:1', 'done a:3']);
  });

  it('settles each item on its own: one refused item does not fail the others; a failed batch fails all of its items', async () => {
    const { writer, release } = controlledWriter({ lanes: 1, maxBatch: 10 });
    const results = Promise.allSettled([writer.submit('a:1'), writer.submit('a:2!'), writer.submit('a:3')]);
    await tick();
    release.shift()!();
    await tick();
    release.shift()!();
    expect((await results).map((r) => r.status)).toEqual(['fulfilled', 'rejected', 'fulfilled']);

    const failing = createGroupCommit<string, string>({
      lanes: 1,
      maxBatch: 10,
      laneKey: () => 'x',
      run: async () => Promise.reject(new Error('database down')),
    });
    await expect(Promise.all([failing.submit('1'), failing.submit('2')])).rejects.toThrow('database down');
  });

  it('keeps one key in one lane, splits batches at maxBatch, and lets other lanes write meanwhile', async () => {
    const { writer, batches, release } = controlledWriter({ lanes: 8, maxBatch: 2 });
    const all = ['a:1', 'a:2', 'a:3', 'a:4', 'a:5'].map((item) => writer.submit(item));
    await tick();
    const other = ['b', 'c', 'd', 'e', 'f', 'g'].map((key) => writer.submit(`${key}:1`));
    await tick();
    // a's first item went alone; the other keys did not wait for it (at least one other lane started).
    expect(batches[0]).toEqual(['a:1']);
    expect(batches.length).toBeGreaterThan(1);
    while (release.length > 0) {
      release.shift()!();
      await tick();
    }
    await Promise.all([...all, ...other]);
    const aBatches = batches.filter((b) => b[0]!.startsWith('a:'));
    expect(aBatches).toEqual([['a:1'], ['a:2', 'a:3'], ['a:4', 'a:5']]);
  });
});
