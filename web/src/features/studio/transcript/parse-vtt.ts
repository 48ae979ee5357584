import webvtt from 'webvtt-parser';

export type TextCue = { id: string; startMs: number; endMs: number; text: string };

/** Cue text without its markup: voice and class tags dropped, character references decoded, lines joined. */
export function plainCueText(raw: string): string {
  // DOMParser builds an inert document (no scripts run, nothing is fetched): safe for decoding only.
  const doc = new DOMParser().parseFromString(`<body>${raw.replace(/\n/g, ' ')}</body>`, 'text/html');
  return (doc.body.textContent ?? '').replace(/\s+/g, ' ').trim();
}

/**
 * Reads a WebVTT file's cues with a conforming parser (webvtt-parser, after the W3C WebVTT spec).
 * Cues the parser could read are kept even when others have errors, so one bad cue does not blank
 * the transcript; `errors` says how many problems were met.
 */
export function parseVtt(text: string, mode?: 'metadata'): { cues: TextCue[]; errors: number } {
  const result = new webvtt.WebVTTParser().parse(text, mode);
  const cues = result.cues.map((cue, index) => ({
    id: cue.id || `cue-${index}`,
    startMs: Math.round(cue.startTime * 1000),
    endMs: Math.round(cue.endTime * 1000),
    text: mode === 'metadata' ? cue.text.trim() : plainCueText(cue.text),
  }));
  return { cues, errors: result.errors.length };
}

/** The cue showing at `ms` (the latest that started, while it lasts), by binary search over start times. */
export function activeCueIndex(cues: readonly TextCue[], ms: number): number {
  let low = 0;
  let high = cues.length - 1;
  let found = -1;
  while (low <= high) {
    const mid = (low + high) >> 1;
    if (cues[mid]!.startMs <= ms) {
      found = mid;
      low = mid + 1;
    } else {
      high = mid - 1;
    }
  }
  if (found === -1) return -1;
  return ms < cues[found]!.endMs ? found : -1;
}
