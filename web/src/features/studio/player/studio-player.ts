import { useCallback, useEffect, useState } from 'react';

/**
 * What the studio uses of the video player (a video.js player fits it): read and set the time, pause,
 * and hear about time changes. Tests drive the studio with a small object of this shape.
 */
export interface StudioPlayer {
  currentTime(seconds?: number): number | undefined;
  pause(): void;
  on(type: string, listener: () => void): void;
  off(type: string, listener?: () => void): void;
}

const TIME_EVENTS = ['timeupdate', 'seeked', 'seeking', 'loadedmetadata'];

/** The player's current time in ms, updated on its time events; `seek` moves it (and the playhead at once). */
export function usePlayerTime(player: StudioPlayer | null) {
  const [currentMs, setCurrentMs] = useState(0);
  useEffect(() => {
    if (!player) return;
    const update = () => setCurrentMs(Math.max(0, (player.currentTime() ?? 0) * 1000));
    update();
    for (const type of TIME_EVENTS) player.on(type, update);
    return () => {
      for (const type of TIME_EVENTS) player.off(type, update);
    };
  }, [player]);
  const seek = useCallback(
    (ms: number) => {
      const target = Math.max(0, ms);
      player?.currentTime(target / 1000);
      setCurrentMs(target);
    },
    [player],
  );
  /** The time now, read from the player itself (state may lag a frame behind while playing). */
  const readMs = useCallback(() => (player ? Math.max(0, (player.currentTime() ?? 0) * 1000) : currentMs), [player, currentMs]);
  return { currentMs, seek, readMs };
}
