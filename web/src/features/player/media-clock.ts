import type { Player } from './video-player';
import type { MediaClock } from './logic/pin-scheduler';

type FrameVideo = HTMLVideoElement & {
  requestVideoFrameCallback?: (callback: (now: number, metadata: { mediaTime: number }) => void) => number;
  cancelVideoFrameCallback?: (handle: number) => void;
};

function videoElementOf(player: Player): FrameVideo | null {
  const element = player.el().querySelector('video');
  return element instanceof HTMLVideoElement ? element : null;
}

/** The scheduler's view of a video.js player; per-frame checks use the element's requestVideoFrameCallback when it has one. */
export function clockOf(player: Player): MediaClock {
  const video = videoElementOf(player);
  const requestFrame =
    video && typeof video.requestVideoFrameCallback === 'function' && typeof video.cancelVideoFrameCallback === 'function'
      ? (callback: (mediaMs: number, wallMs: number) => void) => {
          // The time the callback runs, not the frame's: a late callback must show as a long gap.
          const handle = video.requestVideoFrameCallback?.((_now, metadata) => callback(metadata.mediaTime * 1000, performance.now())) ?? 0;
          return () => video.cancelVideoFrameCallback?.(handle);
        }
      : null;
  return {
    currentMs: () => (player.currentTime() ?? 0) * 1000,
    seekMs: (ms) => {
      player.currentTime(ms / 1000);
    },
    paused: () => player.paused(),
    pause: () => player.pause(),
    rate: () => player.playbackRate() ?? 1,
    requestFrame,
    on: (event, listener) => {
      player.on(event, listener);
      return () => {
        if (!player.isDisposed()) player.off(event, listener);
      };
    },
  };
}
