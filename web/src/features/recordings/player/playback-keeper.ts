/**
 * Keeps a video playing across expiring presigned URLs. The page fetches new URLs shortly before
 * `expiresAt` (or after a media error, which is how an expired URL shows mid-play); the keeper remembers
 * the moment and whether it was playing before the source is swapped, and returns there once the new
 * source has loaded. Free of React and the DOM, so the rules can be tested on their own.
 */
export type MediaLike = { currentTime: number; paused: boolean; ended: boolean; play: () => Promise<void> | void };
export type ResumePoint = { time: number; playing: boolean };

/** New URLs are fetched this long before the old ones stop working. */
export const REFRESH_MARGIN_MS = 5 * 60_000;
/** Never sooner than this, so a clock far off from the server's cannot cause a stream of requests. */
export const MIN_REFRESH_DELAY_MS = 30_000;

/** setTimeout fires at once for delays past 2^31 - 1 ms (about 24.8 days): a far expiry waits this long instead. */
export const MAX_REFRESH_DELAY_MS = 2 ** 31 - 1;

/** Milliseconds from `now` until the page should fetch fresh playback URLs. */
export function msUntilRefresh(expiresAt: string, now: number, margin = REFRESH_MARGIN_MS): number {
  const expires = Date.parse(expiresAt);
  if (Number.isNaN(expires)) return MIN_REFRESH_DELAY_MS;
  return Math.min(MAX_REFRESH_DELAY_MS, Math.max(MIN_REFRESH_DELAY_MS, expires - margin - now));
}

export function resumePointOf(media: Pick<MediaLike, 'currentTime' | 'paused' | 'ended'>): ResumePoint {
  return { time: media.currentTime, playing: !media.paused && !media.ended };
}

export class PlaybackKeeper {
  private pending: ResumePoint | null = null;
  private errorsSinceLoad = 0;

  /** Just before the source changes: where to come back to. A second swap before the load keeps the first point. */
  beforeSwap(media: Pick<MediaLike, 'currentTime' | 'paused' | 'ended'>): void {
    this.pending ??= resumePointOf(media);
  }

  /** The new source's metadata has loaded: seek back and, if it was playing, play on. */
  afterLoad(media: MediaLike): void {
    this.errorsSinceLoad = 0;
    const point = this.pending;
    this.pending = null;
    if (!point) return;
    if (point.time > 0) media.currentTime = point.time;
    if (point.playing) {
      // A browser may refuse to play without a fresh gesture; the controls stay there to press play.
      Promise.resolve(media.play()).catch(() => undefined);
    }
  }

  /**
   * A media error. True when fresh URLs may fix it: the first error since the last successful load.
   * A second one in a row means the file itself does not play, and asking again would only loop.
   */
  onError(): boolean {
    this.errorsSinceLoad += 1;
    return this.errorsSinceLoad === 1;
  }

  /** The viewer asked to try again after the player gave up. */
  reset(): void {
    this.errorsSinceLoad = 0;
  }
}
