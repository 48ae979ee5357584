/** A Map whose entries vanish after a fixed time; old entries are swept on each insert. */
export class ExpiringMap<K, V> {
  readonly #entries = new Map<K, { value: V; expiresAt: number }>();

  constructor(readonly ttlMs: number) {}

  set(key: K, value: V): void {
    const now = Date.now();
    for (const [k, entry] of this.#entries) if (entry.expiresAt <= now) this.#entries.delete(k);
    this.#entries.set(key, { value, expiresAt: now + this.ttlMs });
  }

  get(key: K): V | undefined {
    const entry = this.#entries.get(key);
    if (!entry) return undefined;
    if (entry.expiresAt <= Date.now()) {
      this.#entries.delete(key);
      return undefined;
    }
    return entry.value;
  }

  /** Gets and removes: for single-use values such as authorization codes. */
  take(key: K): V | undefined {
    const value = this.get(key);
    this.#entries.delete(key);
    return value;
  }
}
