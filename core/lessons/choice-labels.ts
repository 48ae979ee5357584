import { SIGN_CHOICES, type SignChoiceSet } from '../contracts/checkpoints';

/** What each "check your sign" choice reads as, on buttons and in feedback. */
export const SIGN_CHOICE_LABELS: Record<string, string> = {
  '+': 'Positive',
  '-': 'Negative',
  '0': 'Zero',
  '+x': '+x direction',
  '-x': '−x direction',
  '+y': '+y direction',
  '-y': '−y direction',
  '+z': '+z direction',
  '-z': '−z direction',
  into: 'Into the page',
  out: 'Out of the page',
  clockwise: 'Clockwise',
  anticlockwise: 'Anticlockwise',
};

/** The choice sets as a teacher picks them. */
export const SIGN_CHOICE_SET_LABELS: Record<SignChoiceSet, string> = {
  sign: 'Sign of a component (+, −, 0)',
  axis: 'Direction along an axis (±x, ±y, ±z)',
  page: 'Into or out of the page',
  rotation: 'Clockwise or anticlockwise',
};

/** The label of a choice; an unknown choice reads as itself. */
export function signChoiceLabel(choice: string): string {
  return Object.hasOwn(SIGN_CHOICE_LABELS, choice) ? (SIGN_CHOICE_LABELS[choice] as string) : choice;
}

/** The choices of a set in their usual order. */
export function signChoicesOf(choiceSet: SignChoiceSet): string[] {
  return [...SIGN_CHOICES[choiceSet]];
}
