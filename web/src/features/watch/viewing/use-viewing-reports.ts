import { useEffect, useRef } from 'react';
import type { ViewingResultDto } from '@core/contracts';
import type { Player } from '@/features/player/video-player';
import { postViewing, sendViewingOnHide } from '../api/report-viewing';
import type { SessionToken } from '../api/session-token';
import { ViewingReporter } from './viewing-reporter';
import { WatchedIntervals } from './watched-intervals';

type Options = {
  player: Player | null;
  assignmentId: string;
  durationMs: number;
  session: SessionToken;
  onResult?: (result: ViewingResultDto) => void;
};

/**
 * Reports what this student actually watched: intervals from the player's play, timeupdate, pause and
 * seek events, sent every 10 s and on pause, seek and when the page is hidden (keepalive fetch), and
 * once more as the page goes away (keepalive fetch or sendBeacon).
 */
export function useViewingReports({ player, assignmentId, durationMs, session, onResult }: Options): void {
  const resultRef = useRef(onResult);
  useEffect(() => {
    resultRef.current = onResult;
  });

  useEffect(() => {
    if (!player) return;
    let positionMs = player.isDisposed() ? 0 : (player.currentTime() ?? 0) * 1000;
    const watched = new WatchedIntervals(durationMs, positionMs);
    // Read on every event, so the last report still knows where the video was after it is disposed.
    const now = () => {
      if (!player.isDisposed()) positionMs = (player.currentTime() ?? 0) * 1000;
      return positionMs;
    };
    const reporter = new ViewingReporter({
      watched,
      positionMs: () => positionMs,
      send: (report) => postViewing(assignmentId, report, session),
      sendOnHide: (report) => sendViewingOnHide(assignmentId, report, session),
      onResult: (result) => resultRef.current?.(result),
    });
    // 'play' comes before the time moves on, so the interval starts where the video stood.
    const onPlay = () => watched.play(now());
    const onTime = () => {
      const ms = now();
      if (!player.paused()) watched.progress(ms);
    };
    const onStop = () => {
      watched.stop(now());
      void reporter.report();
    };
    const onSeeking = () => watched.seeking();
    const onSeeked = () => {
      const ms = now();
      watched.seeked(ms);
      if (!player.paused()) watched.play(ms);
      void reporter.report();
    };
    const events: [string, () => void][] = [
      ['play', onPlay],
      ['timeupdate', onTime],
      ['pause', onStop],
      ['ended', onStop],
      ['seeking', onSeeking],
      ['seeked', onSeeked],
    ];
    for (const [event, listener] of events) player.on(event, listener);
    const onVisibility = () => {
      if (document.visibilityState === 'hidden') void reporter.report();
    };
    const onPageHide = () => reporter.reportOnHide();
    document.addEventListener('visibilitychange', onVisibility);
    window.addEventListener('pagehide', onPageHide);
    reporter.start();
    return () => {
      reporter.stop();
      document.removeEventListener('visibilitychange', onVisibility);
      window.removeEventListener('pagehide', onPageHide);
      if (!player.isDisposed()) for (const [event, listener] of events) player.off(event, listener);
      // Leaving the page inside the app: what was watched since the last report still goes out.
      watched.stop(positionMs);
      reporter.reportOnHide();
    };
  }, [player, assignmentId, durationMs, session]);
}
