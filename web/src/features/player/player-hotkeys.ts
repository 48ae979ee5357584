import type Player from 'video.js/dist/types/player';

/** The player's keyboard shortcuts beyond video.js's own (k/Space play, f full screen, m mute). */
export type HotkeyAction =
  | { type: 'seek-by'; seconds: number }
  | { type: 'seek-to-start' }
  | { type: 'rate-step'; step: 1 | -1 }
  | { type: 'toggle-captions' }
  | { type: 'video.js' };

/** Every shortcut, as the keyboard help lists them. */
export const HOTKEYS: readonly { keys: string; does: string }[] = [
  { keys: 'Space or K', does: 'Play or pause' },
  { keys: '← / →', does: 'Back or forward 5 seconds' },
  { keys: 'J / L', does: 'Back or forward 10 seconds' },
  { keys: 'Home', does: 'Back to the start' },
  { keys: '< / >', does: 'Slower or faster (up to 2×)' },
  { keys: 'C', does: 'Captions on or off' },
  { keys: 'F', does: 'Full screen' },
  { keys: 'M', does: 'Sound on or off' },
];

/** What a key pressed while the player has focus does; null leaves the key to the browser. */
export function hotkeyAction(key: string): HotkeyAction | null {
  switch (key) {
    case 'ArrowLeft':
      return { type: 'seek-by', seconds: -5 };
    case 'ArrowRight':
      return { type: 'seek-by', seconds: 5 };
    case 'j':
    case 'J':
      return { type: 'seek-by', seconds: -10 };
    case 'l':
    case 'L':
      return { type: 'seek-by', seconds: 10 };
    case 'Home':
      return { type: 'seek-to-start' };
    case '<':
      return { type: 'rate-step', step: -1 };
    case '>':
      return { type: 'rate-step', step: 1 };
    case 'c':
    case 'C':
      return { type: 'toggle-captions' };
    case 'k':
    case 'K':
    case ' ':
    case 'f':
    case 'F':
    case 'm':
    case 'M':
      return { type: 'video.js' };
    default:
      return null;
  }
}

/** The next playback rate up or down the menu's list (stays at the ends). */
export function stepRate(rates: readonly number[], current: number, step: 1 | -1): number {
  const index = rates.findIndex((rate) => Math.abs(rate - current) < 1e-6);
  let next: number;
  if (index !== -1) next = index + step;
  else {
    // Not on the list (set elsewhere): the neighbour on that side.
    const above = rates.findIndex((rate) => rate > current);
    const insertAt = above === -1 ? rates.length : above;
    next = step > 0 ? insertAt : insertAt - 1;
  }
  return rates[Math.min(rates.length - 1, Math.max(0, next))] ?? current;
}

type TrackLike = { kind: string; mode: string };

function captionTracks(player: Player): TrackLike[] {
  const list = player.textTracks() as unknown as ArrayLike<TrackLike>;
  return Array.from({ length: list.length }, (_, i) => list[i]).filter(
    (track): track is TrackLike => track !== undefined && (track.kind === 'captions' || track.kind === 'subtitles'),
  );
}

/**
 * Runs one shortcut on the player. Seeks go through the player's own currentTime, so the pin
 * scheduler's guard still applies: a seek past an unanswered gate comes back to it.
 */
export function applyHotkey(player: Player, action: HotkeyAction, rates: readonly number[]): void {
  switch (action.type) {
    case 'seek-by': {
      const duration = player.duration() ?? Infinity;
      const target = Math.max(0, Math.min(duration, (player.currentTime() ?? 0) + action.seconds));
      player.currentTime(target);
      return;
    }
    case 'seek-to-start':
      player.currentTime(0);
      return;
    case 'rate-step':
      player.playbackRate(stepRate(rates, player.playbackRate() ?? 1, action.step));
      return;
    case 'toggle-captions': {
      const tracks = captionTracks(player);
      const showing = tracks.filter((track) => track.mode === 'showing');
      if (showing.length > 0) for (const track of showing) track.mode = 'disabled';
      else if (tracks[0]) tracks[0].mode = 'showing';
      return;
    }
    case 'video.js':
      return;
  }
}
