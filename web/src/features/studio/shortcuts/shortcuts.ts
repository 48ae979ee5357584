import { CHECKPOINT_KINDS, CHECKPOINT_KIND_LABELS, type CheckpointKind } from '@core/contracts';

export type StudioAction =
  | { type: 'undo' }
  | { type: 'redo' }
  | { type: 'pin-prefix' }
  | { type: 'pin'; kind: CheckpointKind }
  | { type: 'nudge'; frames: number }
  | { type: 'nudge-seconds'; seconds: number }
  | { type: 'step-playhead'; frames: number }
  | { type: 'delete' }
  | { type: 'deselect' }
  | { type: 'zoom'; direction: 'in' | 'out' }
  | { type: 'chapter-here' }
  | { type: 'help' };

export type KeyLike = Pick<KeyboardEvent, 'key' | 'code' | 'shiftKey' | 'ctrlKey' | 'metaKey' | 'altKey'>;

/** Every shortcut, as the help sheet lists it (the matcher below is the one source of behaviour). */
export const SHORTCUT_HELP: { keys: string[]; does: string }[] = [
  ...CHECKPOINT_KINDS.map((kind, index) => ({
    keys: ['P', String(index + 1)],
    does: `Pin a ${CHECKPOINT_KIND_LABELS[kind].toLowerCase()} at the current frame`,
  })),
  { keys: [','], does: 'Move the selected checkpoint one frame earlier' },
  { keys: ['.'], does: 'Move the selected checkpoint one frame later' },
  { keys: ['Shift', ','], does: 'Move the selected checkpoint one second earlier' },
  { keys: ['Shift', '.'], does: 'Move the selected checkpoint one second later' },
  { keys: ['['], does: 'Step the video back one frame' },
  { keys: [']'], does: 'Step the video forward one frame' },
  { keys: ['←', '→'], does: 'On a timeline marker: focus the previous or next checkpoint' },
  { keys: ['Enter'], does: 'On a timeline marker: select it and open it in the side panel' },
  { keys: ['C'], does: 'Add a chapter at the current frame (or over the marked range)' },
  { keys: ['='], does: 'Zoom the timeline in' },
  { keys: ['-'], does: 'Zoom the timeline out' },
  { keys: ['Delete'], does: 'Delete the selected checkpoint (undo brings it back)' },
  { keys: ['Esc'], does: 'Clear the selection and show the lesson settings' },
  { keys: ['Ctrl', 'Z'], does: 'Undo (⌘ Z on a Mac)' },
  { keys: ['Ctrl', 'Shift', 'Z'], does: 'Redo (also Ctrl Y; ⌘ Shift Z on a Mac)' },
  { keys: ['?'], does: 'Show or hide this list' },
];

/** Typing in a field must never trigger a studio shortcut. */
export function isTypingTarget(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  if (target.isContentEditable) return true;
  if (target instanceof HTMLTextAreaElement || target instanceof HTMLSelectElement) return true;
  if (target instanceof HTMLInputElement) {
    return !['button', 'checkbox', 'radio', 'range', 'reset', 'submit', 'color', 'file', 'image'].includes(target.type);
  }
  return false;
}

/** The studio action for a key press; `pinPrefix` is true right after P. */
export function matchShortcut(event: KeyLike, pinPrefix: boolean): StudioAction | null {
  const command = event.ctrlKey || event.metaKey;
  if (command && !event.altKey) {
    const key = event.key.toLowerCase();
    if (key === 'z') return event.shiftKey ? { type: 'redo' } : { type: 'undo' };
    if (key === 'y' && !event.shiftKey) return { type: 'redo' };
    return null;
  }
  if (event.ctrlKey || event.metaKey || event.altKey) return null;
  if (pinPrefix && /^Digit[1-7]$|^Numpad[1-7]$/.test(event.code || '')) {
    return { type: 'pin', kind: CHECKPOINT_KINDS[Number(event.code.slice(-1)) - 1]! };
  }
  if (pinPrefix && /^[1-7]$/.test(event.key)) return { type: 'pin', kind: CHECKPOINT_KINDS[Number(event.key) - 1]! };
  // Comma and period by their physical key, so Shift works on layouts where Shift+, is not "<".
  if (event.code === 'Comma' || event.key === ',' || event.key === '<') {
    return event.shiftKey || event.key === '<' ? { type: 'nudge-seconds', seconds: -1 } : { type: 'nudge', frames: -1 };
  }
  if (event.code === 'Period' || event.key === '.' || event.key === '>') {
    return event.shiftKey || event.key === '>' ? { type: 'nudge-seconds', seconds: 1 } : { type: 'nudge', frames: 1 };
  }
  switch (event.key) {
    case 'p':
    case 'P':
      return { type: 'pin-prefix' };
    case '[':
      return { type: 'step-playhead', frames: -1 };
    case ']':
      return { type: 'step-playhead', frames: 1 };
    case 'c':
    case 'C':
      return { type: 'chapter-here' };
    case '=':
    case '+':
      return { type: 'zoom', direction: 'in' };
    case '-':
      return { type: 'zoom', direction: 'out' };
    case 'Delete':
    case 'Backspace':
      return { type: 'delete' };
    case 'Escape':
      return { type: 'deselect' };
    case '?':
      return { type: 'help' };
    default:
      return null;
  }
}
