import { openDB, type DBSchema, type IDBPDatabase } from 'idb';
import { OutboxEntrySchema, type OutboxEntry } from './outbox-entry';

/** Where unsent answers are kept: IndexedDB in the browser, a map in tests of the queue's rules. */
export interface OutboxStore {
  /** This student's entries, oldest first; entries that no longer read as an entry are dropped. */
  list(userId: string): Promise<OutboxEntry[]>;
  put(entry: OutboxEntry): Promise<void>;
  delete(idempotencyKey: string): Promise<void>;
}

interface OutboxDb extends DBSchema {
  answers: { key: string; value: OutboxEntry; indexes: { 'by-user': string } };
}

const DB_NAME = 'pinfield-answer-outbox';
const DB_VERSION = 1;

/** The browser's store. The database is opened on first use; a browser without IndexedDB rejects every call. */
export function indexedDbOutboxStore(): OutboxStore {
  let opened: Promise<IDBPDatabase<OutboxDb>> | null = null;
  const db = () => {
    if (typeof indexedDB === 'undefined') return Promise.reject(new Error('This browser has no IndexedDB.'));
    opened ??= openDB<OutboxDb>(DB_NAME, DB_VERSION, {
      upgrade(database) {
        const store = database.createObjectStore('answers', { keyPath: 'idempotencyKey' });
        store.createIndex('by-user', 'userId');
      },
    }).catch((error: unknown) => {
      // A later call may succeed (a blocked upgrade, a private window that allows it again).
      opened = null;
      throw error;
    });
    return opened;
  };
  return {
    async list(userId) {
      const database = await db();
      const rows: unknown[] = await database.getAllFromIndex('answers', 'by-user', userId);
      const entries: OutboxEntry[] = [];
      for (const row of rows) {
        const parsed = OutboxEntrySchema.safeParse(row);
        if (parsed.success) entries.push(parsed.data);
        else if (row && typeof row === 'object' && 'idempotencyKey' in row && typeof row.idempotencyKey === 'string') {
          // Written by another version of the page and unreadable now: it can never be sent.
          await database.delete('answers', row.idempotencyKey);
        }
      }
      return entries.sort((a, b) => a.queuedAt - b.queuedAt);
    },
    async put(entry) {
      await (await db()).put('answers', entry);
    },
    async delete(idempotencyKey) {
      await (await db()).delete('answers', idempotencyKey);
    },
  };
}
