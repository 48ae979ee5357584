import { randomUUID } from 'node:crypto';

/** One received e-mail as the inbox JSON returns it. */
export interface StoredMessage {
  id: string;
  /** The From header as written ("Name <address>"), or the envelope sender when there is none. */
  from: string;
  /** Envelope recipients (RCPT TO): everyone the message was delivered to, Bcc included. */
  to: string[];
  subject: string;
  text: string;
  /** The HTML part, or null for a text-only message. */
  html: string | null;
  /** When the fake received it (ISO 8601). */
  date: string;
}

/** In-memory mailbox, newest first, keeping at most `capacity` messages. */
export class MailStore {
  #messages: StoredMessage[] = [];

  constructor(readonly capacity = 500) {}

  add(message: Omit<StoredMessage, 'id'>): StoredMessage {
    const stored = { id: randomUUID(), ...message };
    this.#messages.unshift(stored);
    if (this.#messages.length > this.capacity) this.#messages.length = this.capacity;
    return stored;
  }

  /** Newest first; `to` keeps only messages delivered to that address (any letter case). */
  list(to?: string): StoredMessage[] {
    if (to === undefined) return [...this.#messages];
    const wanted = to.trim().toLowerCase();
    return this.#messages.filter((message) => message.to.some((address) => address.toLowerCase() === wanted));
  }

  get(id: string): StoredMessage | undefined {
    return this.#messages.find((message) => message.id === id);
  }

  /** Removes every message and says how many there were. */
  clear(): number {
    const count = this.#messages.length;
    this.#messages = [];
    return count;
  }
}
