import { useEffect, useRef, useState } from 'react';
import { isTypingTarget, matchShortcut, type StudioAction } from './shortcuts';

/** How long "P" waits for its digit. */
const PIN_PREFIX_MS = 2000;

/**
 * The studio's keyboard shortcuts on the whole page, except while typing in a field or while a dialog
 * is open. `run` receives each matched action; "P" alone arms the pin prefix for the next key.
 */
export function useStudioShortcuts(run: (action: StudioAction) => void, enabled = true) {
  const [pinPrefix, setPinPrefix] = useState(false);
  const prefix = useRef(false);
  const latestRun = useRef(run);
  useEffect(() => {
    latestRun.current = run;
  });

  useEffect(() => {
    if (!enabled) return;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const arm = (on: boolean) => {
      prefix.current = on;
      setPinPrefix(on);
      clearTimeout(timer);
      if (on) timer = setTimeout(() => arm(false), PIN_PREFIX_MS);
    };
    const onKeyDown = (event: KeyboardEvent) => {
      if (event.defaultPrevented || (event.repeat && event.key.toLowerCase() === 'p')) return;
      if (isTypingTarget(event.target)) return;
      if (document.querySelector('dialog[open]')) return;
      const action = matchShortcut(event, prefix.current);
      const wasArmed = prefix.current;
      if (wasArmed && ['Shift', 'Control', 'Alt', 'Meta'].includes(event.key)) return;
      if (wasArmed) arm(false);
      if (!action) return;
      event.preventDefault();
      if (action.type === 'pin-prefix') {
        arm(!wasArmed);
        return;
      }
      latestRun.current(action);
    };
    window.addEventListener('keydown', onKeyDown);
    return () => {
      clearTimeout(timer);
      window.removeEventListener('keydown', onKeyDown);
    };
  }, [enabled]);

  return { pinPrefix };
}
