// webvtt-parser 2.2.0 ships no types: only what the studio reads (cues of captions and thumbnails).
declare module 'webvtt-parser' {
  export interface WebVttCue {
    id: string;
    startTime: number;
    endTime: number;
    text: string;
  }
  export interface WebVttParseResult {
    cues: WebVttCue[];
    errors: { message: string; line: number; col?: number }[];
  }
  export class WebVTTParser {
    constructor(entities?: Record<string, string>);
    parse(input: string, mode?: 'metadata' | 'chapters'): WebVttParseResult;
  }
  const webvtt: { WebVTTParser: typeof WebVTTParser };
  export default webvtt;
}
