import { create as contentDisposition } from 'content-disposition';
import type { ObjectStorage } from '../../storage/object-storage';

/** Posters in list and detail answers: pages refetch long before an hour passes. */
export const POSTER_URL_SECONDS = 60 * 60;
/** SigV4 presigned URLs cannot last longer than seven days (AWS S3 docs, "Sharing objects with presigned URLs"). */
export const SIGV4_MAX_SECONDS = 7 * 24 * 60 * 60;
/** A playback URL outlives the recording by this much, so a paused, then finished, viewing still plays. */
const PLAYBACK_MARGIN_SECONDS = 30 * 60;

export interface SignedUrl {
  url: string;
  expiresAt: string;
}

/** max(PLAYBACK_URL_MINUTES, duration + 30 min), capped at what SigV4 allows. */
export function playbackLifetimeSeconds(playbackMinutes: number, durationSeconds: number | null): number {
  const wanted = Math.max(playbackMinutes * 60, Math.ceil((durationSeconds ?? 0) + PLAYBACK_MARGIN_SECONDS));
  return Math.min(wanted, SIGV4_MAX_SECONDS);
}

/**
 * Presigned GETs of recording objects, one object per URL. The API never stores these: each answer
 * signs afresh. `expiresInSeconds` overrides the lifetime (tests sign 1-second URLs through it).
 */
export function createMediaUrls(storage: ObjectStorage, playbackMinutes: number) {
  async function sign(
    key: string,
    expiresInSeconds: number,
    extra: { contentType?: string; contentDisposition?: string } = {},
  ): Promise<SignedUrl> {
    const signedAt = Date.now();
    const url = await storage.signGet(key, { expiresInSeconds, ...extra });
    return { url, expiresAt: new Date(signedAt + expiresInSeconds * 1000).toISOString() };
  }

  return {
    sign,

    /** The poster for a list or detail answer, or null before processing made one. */
    async poster(posterKey: string | null): Promise<string | null> {
      return posterKey ? (await sign(posterKey, POSTER_URL_SECONDS)).url : null;
    },

    /** An object the player fetches during a viewing: rendition, poster or thumbnail sheet. */
    playback(key: string, durationSeconds: number | null, options: { expiresInSeconds?: number } = {}): Promise<SignedUrl> {
      return sign(key, options.expiresInSeconds ?? playbackLifetimeSeconds(playbackMinutes, durationSeconds));
    },

    /**
     * The original, as a download under its original name: RFC 6266 `attachment` with an ASCII
     * `filename` fallback and the exact name in RFC 5987/8187 `filename*` (spaces, accents, any script).
     */
    download(key: string, fileName: string, durationSeconds: number | null, contentType: string | null): Promise<SignedUrl> {
      return sign(key, playbackLifetimeSeconds(playbackMinutes, durationSeconds), {
        // The type sniffed from the bytes, not the one the browser declared at upload.
        contentType: contentType ?? undefined,
        contentDisposition: contentDisposition(fileName, { type: 'attachment' }),
      });
    },
  };
}

export type MediaUrls = ReturnType<typeof createMediaUrls>;
