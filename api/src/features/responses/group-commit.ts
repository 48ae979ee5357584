/**
 * Group commit: submissions that arrive while a transaction is in flight wait and go together in the
 * next one, so under load one commit carries many answers (and one fsync), while a lone answer is
 * written at once. Each caller's promise settles only after the transaction that holds its item has
 * committed (or failed): nothing is answered before its row is durable.
 *
 * Items are spread over `lanes` by key (a student), so one student's answers always queue in one
 * lane, in arrival order, and lanes never wait on each other's row locks.
 */

export type Settled<R> = { ok: true; value: R } | { ok: false; error: unknown };

export interface GroupCommitOptions<T, R> {
  lanes: number;
  maxBatch: number;
  laneKey(item: T): string;
  /** Writes one batch; returns one result per item, in order, or throws to fail the whole batch. */
  run(items: T[]): Promise<Settled<R>[]>;
}

interface Waiting<T, R> {
  item: T;
  resolve(value: R): void;
  reject(error: unknown): void;
}

function laneIndex(key: string, lanes: number): number {
  let hash = 0;
  for (let i = 0; i < key.length; i += 1) hash = (hash * 31 + key.charCodeAt(i)) | 0;
  return Math.abs(hash) % lanes;
}

export function createGroupCommit<T, R>(options: GroupCommitOptions<T, R>) {
  const lanes = Array.from({ length: options.lanes }, () => ({ queue: [] as Waiting<T, R>[], running: false }));

  async function drain(lane: (typeof lanes)[number]): Promise<void> {
    lane.running = true;
    while (lane.queue.length > 0) {
      const batch = lane.queue.splice(0, options.maxBatch);
      try {
        const results = await options.run(batch.map((w) => w.item));
        batch.forEach((waiting, index) => {
          const result = results[index];
          if (!result) waiting.reject(new Error('group commit returned no result for an item'));
          else if (result.ok) waiting.resolve(result.value);
          else waiting.reject(result.error);
        });
      } catch (error) {
        for (const waiting of batch) waiting.reject(error);
      }
    }
    lane.running = false;
  }

  return {
    submit(item: T): Promise<R> {
      return new Promise<R>((resolve, reject) => {
        const lane = lanes[laneIndex(options.laneKey(item), lanes.length)]!;
        lane.queue.push({ item, resolve, reject });
        if (!lane.running) void drain(lane);
      });
    },
  };
}
