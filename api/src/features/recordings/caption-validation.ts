import webvtt from 'webvtt-parser';
import type { WebVttParseError } from 'webvtt-parser';
import { ValidationError } from '../../errors';

/** At most this many problems are listed: a binary file dropped in by mistake yields thousands. */
const MAX_LISTED = 50;

// webvtt-parser 2.2.0 reports errors inside cue text against the line after the cue, with a column
// counted through the cue's joined lines; these are its cue-text messages (from parser.js).
const CUE_TEXT_MESSAGES = new Set([
  '<v> cannot be nested inside itself.',
  '<v> requires an annotation.',
  'End tags not allowed in chapter title text.',
  'Incorrect end tag.',
  'Incorrect escape.',
  'Incorrect start tag.',
  'Only <v> and <lang> can have an annotation.',
  'Required end tag missing.',
  'Start tags not allowed in chapter title text.',
  'Timestamp must be between start timestamp and end timestamp.',
  'Timestamp must be greater than any previous timestamp.',
  'Timestamp not allowed in chapter title text.',
]);

interface Position {
  line: number;
  col?: number;
}

/** Moves a cue-text error onto the line and column an editor shows for it. */
function cueTextPosition(lines: string[], error: WebVttParseError): Position {
  const lastTextLine = error.line - 2; // 0-based: the parser points at the line after the cue text
  let timingLine = lastTextLine;
  while (timingLine >= 0 && !lines[timingLine]!.includes('-->')) timingLine--;
  if (timingLine < 0 || error.col === undefined) return { line: error.line, col: error.col };
  let offset = error.col - 1;
  for (let index = timingLine + 1; index <= lastTextLine; index++) {
    const length = lines[index]!.length;
    if (offset <= length || index === lastTextLine) return { line: index + 1, col: Math.min(offset, length) + 1 };
    offset -= length + 1;
  }
  return { line: error.line, col: error.col };
}

function positionOf(lines: string[], error: WebVttParseError): Position {
  return CUE_TEXT_MESSAGES.has(error.message) ? cueTextPosition(lines, error) : { line: error.line, col: error.col };
}

/**
 * Checks a WebVTT file with a conforming parser (webvtt-parser, after the W3C WebVTT spec) and
 * returns its cue count; throws 400 `caption_invalid` listing each problem as `line N`.
 */
export function validateWebVtt(text: string): { cueCount: number } {
  const parser = new webvtt.WebVTTParser();
  const result = parser.parse(text);
  if (result.errors.length > 0) {
    const lines = text.replace(/\0/g, '\uFFFD').split(/\r\n|\r|\n/);
    const problems = result.errors
      .map((error) => ({ ...positionOf(lines, error), message: error.message }))
      .sort((a, b) => a.line - b.line || (a.col ?? 0) - (b.col ?? 0));
    const details = problems.slice(0, MAX_LISTED).map((problem) => ({
      path: `line ${problem.line}`,
      message: problem.col === undefined ? problem.message : `${problem.message} (column ${problem.col})`,
    }));
    const count = problems.length;
    const summary =
      count === 1
        ? `The caption file has a problem on line ${problems[0]!.line}: fix it and choose the file again.`
        : count > MAX_LISTED
          ? `The caption file has ${count} problems; the first ${MAX_LISTED} are listed. Is it a WebVTT (.vtt) file?`
          : `The caption file has ${count} problems: fix them and choose the file again.`;
    throw new ValidationError(summary, details, 'caption_invalid');
  }
  if (result.cues.length === 0) {
    throw new ValidationError(
      'The caption file has no cues: add at least one timed caption, like "00:00.000 --> 00:02.000" and a line of text.',
      [{ path: 'vtt', message: 'No cues found after the WEBVTT line.' }],
      'caption_invalid',
    );
  }
  return { cueCount: result.cues.length };
}
