import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import { openDB } from 'idb';
import { beforeEach, describe, expect, it } from 'vitest';
import type { OutboxEntry } from './outbox-entry';
import { indexedDbOutboxStore } from './outbox-store';

const USER = '00000000-0000-4000-8000-0000000000a1';
const OTHER = '00000000-0000-4000-8000-0000000000b2';

function entry(n: number, userId = USER): OutboxEntry {
  const idempotencyKey = `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;
  return {
    idempotencyKey,
    userId,
    schoolId: '11111111-1111-4111-8111-111111111111',
    assignmentId: '00000000-0000-4000-8000-0000000000c3',
    attempt: 1,
    queuedAt: 1000 - n,
    body: { idempotencyKey, checkpointKey: 'numer1', answer: { kind: 'numeric', text: '63 uT' }, answeredAt: '2026-12-01T10:00:00.000Z' },
  };
}

beforeEach(() => {
  // A fresh, empty IndexedDB for each test.
  globalThis.indexedDB = new IDBFactory();
});

describe('indexedDbOutboxStore', () => {
  it('keeps entries across store instances (a reload), per student, oldest first', async () => {
    const first = indexedDbOutboxStore();
    await first.put(entry(1));
    await first.put(entry(2));
    await first.put(entry(3, OTHER));
    const afterReload = indexedDbOutboxStore();
    expect((await afterReload.list(USER)).map((e) => e.queuedAt)).toEqual([998, 999]);
    await afterReload.delete(entry(2).idempotencyKey);
    expect((await afterReload.list(USER)).map((e) => e.idempotencyKey)).toEqual([entry(1).idempotencyKey]);
    expect(await afterReload.list(OTHER)).toHaveLength(1);
  });

  it('drops a stored row that no longer reads as an answer', async () => {
    const store = indexedDbOutboxStore();
    await store.put(entry(1));
    const raw = await openDB('pinfield-answer-outbox', 1);
    await raw.put('answers', { idempotencyKey: 'broken', userId: USER, body: 'not an answer' });
    raw.close();
    expect((await store.list(USER)).map((e) => e.idempotencyKey)).toEqual([entry(1).idempotencyKey]);
    const again = await openDB('pinfield-answer-outbox', 1);
    expect(await again.get('answers', 'broken')).toBeUndefined();
    again.close();
  });
});
