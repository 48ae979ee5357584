// webvtt-parser 2.2.0 ships no types: only what caption validation uses.
declare module 'webvtt-parser' {
  export interface WebVttCue {
    id: string;
    startTime: number;
    endTime: number;
    text: string;
  }
  /** `line` is 1-based; `col` (1-based) is within the timing line, or within the joined cue text for cue-text errors. */
  export interface WebVttParseError {
    message: string;
    line: number;
    col?: number;
  }
  export interface WebVttParseResult {
    cues: WebVttCue[];
    errors: WebVttParseError[];
    styles: string[];
  }
  export class WebVTTParser {
    constructor(entities?: Record<string, string>);
    parse(input: string, mode?: 'metadata' | 'chapters'): WebVttParseResult;
  }
  const webvtt: { WebVTTParser: typeof WebVTTParser };
  export default webvtt;
}
