import { useCallback, useEffect, useRef, useState, type SyntheticEvent } from 'react';
import { usePlayback } from '../api/get-playback';
import { msUntilRefresh, PlaybackKeeper } from './playback-keeper';

/** The playback URLs of a ready recording, renewed before they expire and after a media error. */
export function useKeptPlayback(recordingId: string) {
  const playback = usePlayback(recordingId, true);
  const videoRef = useRef<HTMLVideoElement>(null);
  const [keeper] = useState(() => new PlaybackKeeper());
  const [stuck, setStuck] = useState(false);
  const { refetch } = playback;

  const refresh = useCallback(() => {
    const video = videoRef.current;
    if (video) keeper.beforeSwap(video);
    const before = video?.getAttribute('src');
    void refetch().then((result) => {
      // The same URL again leaves the src attribute as it was, which would not reload: ask the element to.
      if (video && result.data && result.data.src.url === before) video.load();
    });
  }, [keeper, refetch]);

  const expiresAt = playback.data?.expiresAt;
  useEffect(() => {
    if (!expiresAt) return;
    const timer = setTimeout(refresh, msUntilRefresh(expiresAt, Date.now()));
    return () => clearTimeout(timer);
  }, [expiresAt, refresh]);

  return {
    playback,
    stuck,
    videoRef,
    onError: () => {
      if (keeper.onError()) refresh();
      else setStuck(true);
    },
    onLoadedMetadata: (event: SyntheticEvent<HTMLVideoElement>) => {
      setStuck(false);
      keeper.afterLoad(event.currentTarget);
    },
    tryAgain: () => {
      keeper.reset();
      setStuck(false);
      refresh();
    },
  };
}
