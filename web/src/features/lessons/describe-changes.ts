import type { VersionChanges } from '@core/contracts';

// Checkpoint fields as a teacher reads them; a field not listed is shown with its name split into words.
const CHECKPOINT_FIELDS: Record<string, string> = {
  atMs: 'time',
  label: 'label',
  behaviour: 'behaviour',
  required: 'required or optional',
  points: 'points',
  attempts: 'attempts',
  hints: 'hints',
  explanation: 'explanation',
  prompt: 'prompt',
  options: 'options',
  allowSeveral: 'several correct answers',
  shuffle: 'shuffling',
  expected: 'expected answer',
  askedUnit: 'unit asked for',
  variables: 'variables',
  relativeTolerancePercent: 'relative tolerance',
  absoluteTolerance: 'absolute tolerance',
  sigFigs: 'significant figures',
  requireUnit: 'unit required',
  distractors: 'common mistakes',
  accepted: 'accepted answers',
  caseSensitive: 'case rule',
  spacing: 'spacing rule',
  latex: 'equation',
  caption: 'caption',
  model: 'live model',
  choiceSet: 'choices',
  answer: 'correct answer',
  response: 'response',
  revealAtMs: 'reveal time',
  revealText: 'reveal text',
  askExplanation: 'explain the difference',
  scored: 'scoring',
  tone: 'tone',
  body: 'note text',
  kind: 'kind',
};

const SETTINGS_FIELDS: Record<string, string> = {
  title: 'title',
  description: 'description',
  tags: 'tags',
  level: 'level',
  safetyNotes: 'safety notes',
  minSpacingMs: 'minimum spacing between checkpoints',
};

function inWords(field: string, known: Record<string, string>): string {
  return known[field] ?? field.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
}

/** "a", "a and b", "a, b and c". */
export function joinWords(words: string[]): string {
  if (words.length <= 1) return words.join('');
  return `${words.slice(0, -1).join(', ')} and ${words.at(-1)}`;
}

const quoted = (label: string) => `“${label}”`;

/** What a version changed, one sentence per kind of change, for the versions list. Empty when nothing did. */
export function describeChanges(changes: VersionChanges): string[] {
  const lines: string[] = [];
  if (changes.added.length > 0) lines.push(`Added ${joinWords(changes.added.map((item) => quoted(item.label)))}.`);
  if (changes.removed.length > 0) lines.push(`Removed ${joinWords(changes.removed.map((item) => quoted(item.label)))}.`);
  for (const item of changes.edited) {
    const fields = item.fields.map((field) => inWords(field, CHECKPOINT_FIELDS));
    lines.push(fields.length > 0 ? `Edited ${quoted(item.label)}: ${joinWords(fields)}.` : `Edited ${quoted(item.label)}.`);
  }
  if (changes.chaptersChanged) lines.push('Changed the chapters.');
  if (changes.settings.length > 0) {
    lines.push(`Changed the lesson’s ${joinWords(changes.settings.map((field) => inWords(field, SETTINGS_FIELDS)))}.`);
  }
  return lines;
}
