import { getNodeValue, parseTree, printParseErrorCode, type ParseError } from 'jsonc-parser';
import { z } from 'zod';
import { LIMITS } from '../limits';
import { LessonContentSchema, type LessonContent } from '../contracts/lessons';
import {
  duplicateFields,
  issueMessage,
  lineLocator,
  nodeFor,
  startOf,
  SYNTAX_MESSAGES,
  unknownFields,
  type Segment,
} from './lesson-file-problems';

/**
 * Pinfield's own lesson file (documented in LESSON-FILE.md): one JSON object with a format name,
 * a format version, and the lesson content exactly as a draft saves it. Reading it reports every
 * problem with the line an editor shows, so a teacher can fix a hand-edited file.
 */

export const LESSON_FILE_FORMAT = 'pinfield.lesson';
/** Bumped whenever a field is added, removed, renamed or changes meaning (see LESSON-FILE.md). */
export const LESSON_FILE_VERSION = 1;
export const LESSON_FILE_EXTENSION = '.pinfield-lesson.json';
/** A hand-broken file can hold thousands of problems; the first ones are what a person fixes. */
export const LESSON_FILE_PROBLEMS_MAX = 50;

const RecordingFactsSchema = z.object({
  title: z.string({ error: 'Expected the recording title as text.' }).max(LIMITS.recordingTitleMax),
  durationMs: z.number({ error: 'Expected the recording length in milliseconds.' }).int().min(0).nullable(),
});
export type LessonFileRecording = z.infer<typeof RecordingFactsSchema>;

export const LessonFileSchema = z.object({
  format: z.literal(LESSON_FILE_FORMAT),
  formatVersion: z.literal(LESSON_FILE_VERSION),
  /** When the file was written; informational. */
  exportedAt: z.iso.datetime({ error: 'Expected the export time as an ISO 8601 date and time, like 2026-01-31T09:00:00Z.' }).optional(),
  /** The recording the lesson was made on; informational (an import names its own recording). */
  recording: RecordingFactsSchema.optional(),
  lesson: LessonContentSchema,
});
export type LessonFile = z.infer<typeof LessonFileSchema>;

export interface LessonFileProblem {
  /** 1-based, as editors count. */
  line: number;
  /** Where in the file, dot-separated ('lesson.checkpoints.3.prompt'); '' for the file as a whole. */
  path: string;
  message: string;
}

export type LessonFileResult =
  { ok: true; content: LessonContent; recording: LessonFileRecording | null } | { ok: false; problems: LessonFileProblem[] };

/** The file's object for a lesson's content on its recording. */
export function toLessonFile(content: LessonContent, recording: LessonFileRecording, exportedAt = new Date()): LessonFile {
  return {
    format: LESSON_FILE_FORMAT,
    formatVersion: LESSON_FILE_VERSION,
    exportedAt: exportedAt.toISOString(),
    recording: { title: recording.title, durationMs: recording.durationMs },
    lesson: content,
  };
}

/** The file's text: indented so a person can read, edit and compare it. */
export function lessonFileText(file: LessonFile): string {
  return `${JSON.stringify(file, null, 2)}\n`;
}

/** A download name: the title without characters file systems refuse, plus the format's extension. */
export function lessonFileName(title: string): string {
  const safe = title
    // eslint-disable-next-line no-control-regex -- control characters are what file systems refuse
    .replace(/[\\/:*?"<>|\u0000-\u001f\u007f]+/g, ' ')
    .replace(/\s+/g, ' ')
    .trim()
    .slice(0, 120)
    .replace(/^\.+/, '');
  return `${safe || 'lesson'}${LESSON_FILE_EXTENSION}`;
}

/** Every problem of one lesson file (syntax, format, fields, duplicate keys), each with its line. */
export function parseLessonFile(input: string): LessonFileResult {
  // A byte order mark is invisible in editors; offsets then count from the first visible character.
  const text = input.charCodeAt(0) === 0xfeff ? input.slice(1) : input;
  const lineOf = lineLocator(text);
  const problems: LessonFileProblem[] = [];
  const problem = (offset: number, path: Segment[], message: string) =>
    problems.push({ line: lineOf(offset), path: path.join('.'), message });
  const done = (): LessonFileResult => ({
    ok: false,
    problems: problems.sort((a, b) => a.line - b.line).slice(0, LESSON_FILE_PROBLEMS_MAX),
  });

  const syntax: ParseError[] = [];
  const root = parseTree(text, syntax, { disallowComments: true, allowTrailingComma: false, allowEmptyContent: false });
  if (text.trim() === '') {
    problem(0, [], 'The file is empty: a lesson file is one JSON object, starting with {.');
    return done();
  }
  for (const error of syntax)
    problem(error.offset, [], SYNTAX_MESSAGES[printParseErrorCode(error.error)] ?? 'This is not valid JSON here.');
  if (problems.length > 0 || !root) return done();
  if (root.type !== 'object') {
    problem(root.offset, [], 'A lesson file is one JSON object, starting with {.');
    return done();
  }

  const envelope = getNodeValue(root) as Record<string, unknown>;
  const at = (path: Segment[]) => startOf(nodeFor(root, path).node);
  if (!('format' in envelope)) {
    problem(root.offset, ['format'], `This is not a Pinfield lesson file: "format": "${LESSON_FILE_FORMAT}" is missing.`);
  } else if (envelope.format !== LESSON_FILE_FORMAT) {
    problem(
      at(['format']),
      ['format'],
      `"format" is ${JSON.stringify(envelope.format)}, not "${LESSON_FILE_FORMAT}": this is not a Pinfield lesson file.`,
    );
  }
  const version = envelope.formatVersion;
  if (version === undefined) {
    problem(
      root.offset,
      ['formatVersion'],
      `"formatVersion" is missing: this Pinfield reads lesson files of format version ${LESSON_FILE_VERSION}.`,
    );
  } else if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    problem(at(['formatVersion']), ['formatVersion'], `"formatVersion" must be a whole number such as ${LESSON_FILE_VERSION}.`);
  } else if (version > LESSON_FILE_VERSION) {
    problem(
      at(['formatVersion']),
      ['formatVersion'],
      `This file uses format version ${version}, written by a newer Pinfield; this one reads versions up to ${LESSON_FILE_VERSION}. Export the lesson again from a Pinfield that writes version ${LESSON_FILE_VERSION}.`,
    );
  }
  if (!('lesson' in envelope)) problem(root.offset, ['lesson'], 'The field "lesson" is missing: the file holds no lesson.');
  if (problems.length > 0) return done();

  duplicateFields(root, [], lineOf, problem);
  if (problems.length > 0) return done();

  const parsed = LessonFileSchema.safeParse(envelope);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const path = issue.path.filter((segment): segment is Segment => typeof segment !== 'symbol');
      const { node, found } = nodeFor(root, path);
      problem(found ? startOf(node) : node.offset, path, issueMessage(issue, node, found, path.at(-1)));
    }
    return done();
  }

  const unknown: Segment[][] = [];
  unknownFields(envelope, parsed.data, [], unknown);
  for (const path of unknown) {
    problem(
      at(path),
      path,
      `Unknown field "${String(path.at(-1))}": format version ${LESSON_FILE_VERSION} has no such field here (is it misspelt?).`,
    );
  }

  const { lesson } = parsed.data;
  const firstUse = new Map<string, number>();
  const checkUnique = (list: 'checkpoints' | 'chapters', key: string, index: number) => {
    const id = `${list}:${key}`;
    const earlier = firstUse.get(id);
    const path: Segment[] = ['lesson', list, index, 'key'];
    if (earlier === undefined) firstUse.set(id, index);
    else {
      const what = list === 'checkpoints' ? 'checkpoint' : 'chapter';
      problem(at(path), path, `The key "${key}" is also used by ${what} ${earlier + 1}: every ${what} needs its own key.`);
    }
  };
  lesson.checkpoints.forEach((checkpoint, index) => checkUnique('checkpoints', checkpoint.key, index));
  lesson.chapters.forEach((chapter, index) => checkUnique('chapters', chapter.key, index));
  if (problems.length > 0) return done();

  return { ok: true, content: lesson, recording: parsed.data.recording ?? null };
}
