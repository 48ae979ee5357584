import { useEffect, useState } from 'react';
import type { Player } from './video-player';

/** The video's time in ms for display (chapter highlight, data-current-ms); updated on the player's own events. */
export function useCurrentMs(player: Player | null): number {
  const [ms, setMs] = useState(0);
  useEffect(() => {
    if (!player) return;
    const update = () => setMs((player.currentTime() ?? 0) * 1000);
    const events = ['timeupdate', 'seeked', 'pause', 'loadedmetadata'];
    for (const event of events) player.on(event, update);
    return () => {
      if (player.isDisposed()) return;
      for (const event of events) player.off(event, update);
    };
  }, [player]);
  return ms;
}
