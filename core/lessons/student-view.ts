import { SIGN_CHOICES, type Checkpoint } from '../contracts/checkpoints';
import type { LessonContent } from '../contracts/lessons';
import type { StudentCheckpoint, StudentLessonView } from '../contracts/student-checkpoints';
import { usesDecimalComma } from '../physics/units/number-text';
import type { VariableValues } from '../physics/units/types';
import { readAskedUnit } from './numeric-format';
import { drawnValuesFor } from './numeric-spec';
import { fillPlaceholders } from './placeholders';
import { seededShuffle } from './shuffle';

export interface StudentViewOptions {
  /** Per student (the watch page) or per teacher previewing (`preview:<userId>`): draws and option order follow it. */
  seed: string;
  /** The school's BCP 47 locale: drawn values are written with its decimal sign. */
  locale?: string;
  /** Values stored for this student, by checkpoint key (the watch page); others are drawn from `seed`. */
  drawn?: Readonly<Record<string, VariableValues>>;
}

/** Between a drawn value's number and its unit: a no-break space, so a narrow screen never wraps '1.5 A' apart. */
const NUMBER_UNIT_SPACE = '\u00a0';

/** A drawn value as the student reads it: '4,5 cm' in a decimal-comma locale, the unit kept on the number's line. */
function localValue(value: number | string, comma: boolean): string {
  const text = String(value);
  const local = comma ? text.replace(/^(-?\d+)\.(\d)/, '$1,$2') : text;
  return local.replace(/^(\S+)\s+/, `$1${NUMBER_UNIT_SPACE}`);
}

/** The prompt with this student's values, and the values as written; a draft whose variables cannot be drawn keeps its placeholders. */
function numericPrompt(
  checkpoint: Extract<Checkpoint, { kind: 'numeric' }>,
  options: StudentViewOptions,
): { prompt: string; values: Record<string, string> } {
  let drawn: VariableValues;
  try {
    drawn = options.drawn?.[checkpoint.key] ?? drawnValuesFor(checkpoint, options.seed);
  } catch {
    return { prompt: checkpoint.prompt, values: {} };
  }
  const comma = usesDecimalComma(options.locale);
  const values = Object.fromEntries(Object.entries(drawn).map(([name, value]) => [name, localValue(value, comma)]));
  return { prompt: fillPlaceholders(checkpoint.prompt, values), values };
}

/** One checkpoint without its answer key: only the fields the player needs, listed one by one. */
export function toStudentCheckpoint(checkpoint: Checkpoint, options: StudentViewOptions): StudentCheckpoint {
  const base = { key: checkpoint.key, atMs: checkpoint.atMs, label: checkpoint.label, behaviour: checkpoint.behaviour };
  switch (checkpoint.kind) {
    case 'equation':
      return { ...base, kind: 'equation', latex: checkpoint.latex, caption: checkpoint.caption, model: checkpoint.model };
    case 'note':
      return { ...base, kind: 'note', tone: checkpoint.tone, body: checkpoint.body };
    default:
      break;
  }
  const answered = {
    ...base,
    required: checkpoint.required,
    points: checkpoint.points,
    attempts: checkpoint.attempts,
    hintCount: checkpoint.hints.length,
  };
  switch (checkpoint.kind) {
    case 'multiple-choice': {
      const shown = checkpoint.options.map((o) => ({ id: o.id, text: o.text }));
      return {
        ...answered,
        kind: 'multiple-choice',
        prompt: checkpoint.prompt,
        options: checkpoint.shuffle ? seededShuffle(shown, `${options.seed}:${checkpoint.key}`) : shown,
        allowSeveral: checkpoint.allowSeveral,
      };
    }
    case 'numeric': {
      // The unit as the engine writes it ('uT' → 'µT'); kept as typed when it cannot be read.
      const unit = readAskedUnit(checkpoint.askedUnit);
      return {
        ...answered,
        kind: 'numeric',
        ...numericPrompt(checkpoint, options),
        askedUnit: unit.ok ? unit.display : checkpoint.askedUnit,
        dimension: unit.ok ? unit.dimension : '',
      };
    }
    case 'short-text':
      return { ...answered, kind: 'short-text', prompt: checkpoint.prompt };
    case 'sign':
      return {
        ...answered,
        kind: 'sign',
        prompt: checkpoint.prompt,
        choiceSet: checkpoint.choiceSet,
        choices: [...SIGN_CHOICES[checkpoint.choiceSet]],
        // The set-up (conductor, current sense, point) is drawn; the field it gives is the answer and stays here.
        figure: checkpoint.answer.source === 'geometry' ? checkpoint.answer.geometry : null,
      };
    case 'prediction':
      return {
        ...answered,
        kind: 'prediction',
        prompt: checkpoint.prompt,
        options: checkpoint.response.mode === 'choices' ? checkpoint.response.options.map((o) => ({ id: o.id, text: o.text })) : null,
        revealAtMs: checkpoint.revealAtMs,
        askExplanation: checkpoint.askExplanation,
        scored: checkpoint.scored,
      };
  }
}

/**
 * What the student player receives for a lesson: checkpoints sorted by time with every answer key
 * stripped (correct flags, feedback, expected values, variables, tolerances, distractors, hint texts,
 * explanations, accepted answers, sign answers, correct predictions, reveal texts). Numeric prompts
 * carry this seed's drawn values; shuffled options come in this seed's order.
 */
export function toStudentView(content: LessonContent, options: StudentViewOptions): StudentLessonView {
  const checkpoints = content.checkpoints
    .map((checkpoint, index) => ({ checkpoint, index }))
    .sort((a, b) => a.checkpoint.atMs - b.checkpoint.atMs || a.index - b.index)
    .map(({ checkpoint }) => toStudentCheckpoint(checkpoint, options));
  const chapters = [...content.chapters]
    .sort((a, b) => a.startMs - b.startMs)
    .map((c) => ({ key: c.key, title: c.title, startMs: c.startMs, endMs: c.endMs }));
  return {
    title: content.settings.title,
    locale: options.locale ?? 'en-GB',
    safetyNotes: content.settings.safetyNotes,
    chapters,
    checkpoints,
  };
}
