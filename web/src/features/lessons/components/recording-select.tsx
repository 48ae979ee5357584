import type { ComponentProps } from 'react';
import { Field } from '@/components/ui/field';
import { Select } from '@/components/ui/input';

/** A ready recording a lesson can be built on. */
export type RecordingChoice = { id: string; title: string; durationSeconds: number | null };

type RecordingSelectProps = Omit<ComponentProps<typeof Select>, 'id' | 'aria-describedby' | 'invalid'> & {
  recordings: RecordingChoice[];
  error?: string;
  hint?: string;
};

function length(seconds: number | null): string {
  if (seconds === null) return '';
  const whole = Math.round(seconds);
  return ` (${Math.floor(whole / 60)}:${String(whole % 60).padStart(2, '0')})`;
}

/** The school's ready recordings to build a lesson on; spread `form.register('recordingId')` on it. */
export function RecordingSelect({ recordings, error, hint, ...selectProps }: RecordingSelectProps) {
  return (
    <Field label="Recording" hint={hint} error={error}>
      {(control) => (
        <Select {...control} {...selectProps}>
          <option value="">Choose a ready recording</option>
          {recordings.map((recording) => (
            <option key={recording.id} value={recording.id}>
              {recording.title}
              {length(recording.durationSeconds)}
            </option>
          ))}
        </Select>
      )}
    </Field>
  );
}
