import { useCallback, useEffect, useLayoutEffect, useRef, useState } from 'react';
// The default build carries vtt.js, so captions render offline (the "novtt" build fetches it from a CDN).
import videojs from 'video.js';
import type Player from 'video.js/dist/types/player';
import 'video.js/dist/video-js.css';
import './player.css';
import type { PlaybackDto } from '@core/contracts';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { cn } from '@/lib/cn';
import { msUntilRefresh, PlaybackKeeper, type MediaLike } from '@/features/recordings/player/playback-keeper';
import { applyHotkey, hotkeyAction } from './player-hotkeys';

export type { Player };

export type VideoPlayerProps = {
  playback: PlaybackDto;
  /** Called once per created player (again after a StrictMode remount, with the new player). */
  onReady?: (player: Player) => void;
  /**
   * Fetches fresh playback URLs (e.g. a query's refetch) and resolves with them. Called shortly before
   * `expiresAt` and after the first media error; the new `playback` prop is then swapped in and the
   * video resumes at the same moment. Without it the same link is loaded once more after an error.
   */
  onRefresh?: () => Promise<PlaybackDto | undefined>;
  /** Accessible name of the video region. */
  label?: string;
  className?: string;
};

export const PLAYBACK_RATES = [0.5, 0.75, 1, 1.25, 1.5, 2];

/** The player as the keeper sees it: video.js uses methods where the media element has properties. */
export function mediaOf(player: Player): MediaLike {
  return {
    get currentTime() {
      return player.currentTime() ?? 0;
    },
    set currentTime(seconds: number) {
      player.currentTime(seconds);
    },
    get paused() {
      return player.paused();
    },
    get ended() {
      return player.ended();
    },
    play: () => player.play() ?? undefined,
  };
}

function captionSignature(playback: PlaybackDto): string {
  return playback.captions.map((c) => `${c.id}|${c.url}|${c.updatedAt}|${c.isDefault ? 1 : 0}`).join(';');
}

/**
 * video.js 8 in a React component. video.js owns its DOM, so the element is created here imperatively
 * inside a container React never renders into; the player is disposed on unmount, which also makes a
 * StrictMode double mount create a fresh one. Storage URLs are short-lived: fresh ones are asked for
 * before they expire and after a media error, and playback continues at the same moment.
 */
export function VideoPlayer({ playback, onReady, onRefresh, label = 'Video', className }: VideoPlayerProps) {
  const containerRef = useRef<HTMLDivElement>(null);
  const [player, setPlayer] = useState<Player | null>(null);
  const [keeper] = useState(() => new PlaybackKeeper());
  const [stuck, setStuck] = useState(false);
  const [refreshFailed, setRefreshFailed] = useState(false);
  // The URL the player was last given, so a re-render with the same playback never reloads it.
  const appliedUrl = useRef<string | null>(null);
  const latest = useRef({ playback, onReady, onRefresh });
  useLayoutEffect(() => {
    latest.current = { playback, onReady, onRefresh };
  });

  const refresh = useCallback(
    (target: Player) => {
      const ask = latest.current.onRefresh;
      keeper.beforeSwap(mediaOf(target));
      if (!ask) {
        // Nobody to ask for new links: load the same one again (a passing network fault clears this way).
        target.load();
        return;
      }
      const before = latest.current.playback.src.url;
      ask().then(
        (next) => {
          setRefreshFailed(false);
          // The same URL again would not reload the source by itself: ask the player to.
          if (next && next.src.url === before && !target.isDisposed()) target.load();
        },
        () => setRefreshFailed(true),
      );
    },
    [keeper],
  );

  // Create the player once per mount.
  useEffect(() => {
    const container = containerRef.current;
    if (!container) return;
    const element = document.createElement('video-js');
    element.classList.add('vjs-big-play-centered');
    element.setAttribute('playsinline', '');
    container.appendChild(element);
    const first = latest.current.playback;
    appliedUrl.current = first.src.url;
    const created = videojs(element, {
      controls: true,
      fluid: true,
      aspectRatio: '16:9',
      preload: 'metadata',
      playsinline: true,
      playbackRates: PLAYBACK_RATES,
      // A volume slider that pops up instead of sitting in the bar leaves a phone's narrow bar to the progress bar and its checkpoint marks.
      controlBar: { volumePanel: { inline: false } },
      poster: first.posterUrl ?? undefined,
      sources: [{ src: first.src.url, type: first.src.type }],
      userActions: {
        // video.js calls this with the player as `this` for keys pressed while the player has focus (not in text fields).
        hotkeys: function (this: Player, event: KeyboardEvent) {
          const action = hotkeyAction(event.key);
          if (!action) return;
          if (action.type === 'video.js') {
            this.handleHotkeys(event);
            return;
          }
          event.preventDefault();
          event.stopPropagation();
          applyHotkey(this, action, PLAYBACK_RATES);
        },
      },
    });
    created.on('loadedmetadata', () => {
      setStuck(false);
      keeper.afterLoad(mediaOf(created));
    });
    created.on('error', () => {
      if (keeper.onError()) refresh(created);
      else setStuck(true);
    });
    // Focusable, so focus can come back to the player (and its keyboard shortcuts) after a panel closes.
    if (!created.el().hasAttribute('tabindex')) created.el().setAttribute('tabindex', '-1');
    created.ready(() => latest.current.onReady?.(created));
    setPlayer(created);
    return () => {
      setPlayer(null);
      created.dispose();
      element.remove();
    };
  }, [keeper, refresh]);

  // A new source (fresh URLs): remember where we were, swap, and come back there on load.
  const srcUrl = playback.src.url;
  const srcType = playback.src.type;
  useEffect(() => {
    if (!player || player.isDisposed()) return;
    if (appliedUrl.current === srcUrl) return;
    appliedUrl.current = srcUrl;
    keeper.beforeSwap(mediaOf(player));
    player.src({ src: srcUrl, type: srcType });
  }, [player, keeper, srcUrl, srcType]);

  const posterUrl = playback.posterUrl;
  useEffect(() => {
    if (player && !player.isDisposed()) player.poster(posterUrl ?? '');
  }, [player, posterUrl]);

  // Caption tracks, rebuilt when the list changes. They go to the tech, which exists only once the player is ready.
  const captions = captionSignature(playback);
  useEffect(() => {
    if (!player || player.isDisposed()) return;
    let cancelled = false;
    const added: ReturnType<Player['addRemoteTextTrack']>[] = [];
    player.ready(() => {
      if (cancelled || player.isDisposed()) return;
      for (const caption of latest.current.playback.captions) {
        added.push(
          player.addRemoteTextTrack(
            { kind: 'captions', src: caption.url, srclang: caption.language, label: caption.label, default: caption.isDefault },
            true,
          ),
        );
      }
    });
    return () => {
      cancelled = true;
      if (player.isDisposed()) return;
      for (const track of added) player.removeRemoteTextTrack(track);
    };
  }, [player, captions]);

  const expiresAt = playback.expiresAt;
  useEffect(() => {
    if (!player) return;
    const timer = setTimeout(() => refresh(player), msUntilRefresh(expiresAt, Date.now()));
    return () => clearTimeout(timer);
  }, [player, expiresAt, refresh]);

  return (
    <div className={cn('flex flex-col gap-3', className)}>
      <div ref={containerRef} role="region" aria-label={label} className="pf-player" data-player-ready={player ? 'true' : 'false'} />
      {stuck ? (
        <Banner tone="error" title="The video does not play">
          <p>Even with fresh links the browser could not play it. Check the connection, then try again.</p>
          <Button
            size="sm"
            variant="secondary"
            className="mt-2"
            onClick={() => {
              keeper.reset();
              setStuck(false);
              if (player) refresh(player);
            }}
          >
            Try again
          </Button>
        </Banner>
      ) : null}
      {refreshFailed ? (
        <Banner tone="error" title="Fresh links for the video could not be fetched">
          <p>The video may stop when its current link expires. Check the connection; the player will ask again on the next error.</p>
        </Banner>
      ) : null}
    </div>
  );
}
