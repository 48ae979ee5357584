import type { RecordingDto } from '@core/contracts';

type Seen = Pick<RecordingDto, 'id' | 'title' | 'state' | 'failure'>;

/**
 * The sentence a screen reader hears when recordings change state between two refreshes of the library,
 * or '' when nothing changed that is worth saying (processing percentages are not announced).
 */
export function describeStateChanges(before: Seen[] | undefined, after: Seen[] | undefined): string {
  if (!before || !after) return '';
  const previous = new Map(before.map((recording) => [recording.id, recording.state]));
  const sentences: string[] = [];
  for (const recording of after) {
    const was = previous.get(recording.id);
    if (was === undefined || was === recording.state) continue;
    if (recording.state === 'ready') sentences.push(`“${recording.title}” is ready.`);
    else if (recording.state === 'failed')
      sentences.push(`“${recording.title}” failed: ${recording.failure?.message ?? 'no reason given.'}`);
    else if (recording.state === 'processing') sentences.push(`“${recording.title}” is being processed.`);
  }
  return sentences.join(' ');
}
