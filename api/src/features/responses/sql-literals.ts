import pg from 'pg';

/**
 * SQL literals through node-pg's own escaping, for the group commit's multi-statement queries
 * (the simple query protocol takes several statements in one round trip, but no parameters).
 */

export const text = (value: string | null): string => (value === null ? 'NULL' : pg.escapeLiteral(value));
export const number = (value: number | null): string => (value === null || !Number.isFinite(value) ? 'NULL' : String(value));
export const bool = (value: boolean | null): string => (value === null ? 'NULL' : value ? 'true' : 'false');
export const json = (value: unknown): string => (value === null || value === undefined ? 'NULL' : text(JSON.stringify(value)));
export const instant = (value: Date): string => text(value.toISOString());

/** A typed array literal: ARRAY['a','b']::uuid[] (an empty one keeps its type). */
export function array<T>(values: readonly T[], literal: (value: T) => string, type: string): string {
  return `ARRAY[${values.map(literal).join(',')}]::${type}[]`;
}
