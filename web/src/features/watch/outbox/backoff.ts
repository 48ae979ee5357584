/** The first retry after a failed send waits this long; each further failure doubles it. */
export const FIRST_RETRY_MS = 1000;
/** Never longer than this between tries while the page is open. */
export const MAX_RETRY_MS = 60_000;

/** Wait before try number `failures + 1`, with ±20 % jitter so many students coming back online do not all send at once. */
export function retryDelayMs(failures: number, random: number): number {
  const base = Math.min(MAX_RETRY_MS, FIRST_RETRY_MS * 2 ** Math.max(0, failures - 1));
  return Math.round(base * (0.8 + 0.4 * random));
}
