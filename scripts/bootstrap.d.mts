// Types for bootstrap.mjs, which stays plain JavaScript: it runs before node_modules exists.
export interface LockTree {
  packages?: Record<string, { version?: string; optional?: boolean; link?: boolean }>;
}
export const HASH_FILE: string;
export function lockHash(lockText: string): string;
export function installedTreeMatches(lock: LockTree, installed: LockTree): boolean;
export function installState(dir: string): 'missing' | 'stale' | 'fresh';
export function nodeSupported(version: string): boolean;
