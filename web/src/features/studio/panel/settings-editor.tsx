import { useState } from 'react';
import type { LessonProblem, LessonSettings } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { MarkdownField } from '@/components/rich-text/markdown-field';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { SafetySuggestions, appendCaution } from '@/features/lessons/components/safety-suggestions';
import { TagInput } from '@/features/lessons/components/tag-input';
import { messageAt } from '../draft/problems';

type SettingsEditorProps = {
  settings: LessonSettings;
  problems: LessonProblem[];
  lessonId: string;
  /** `field` names the undo group, so typing in one field undoes as one step. */
  onChange: (patch: Partial<LessonSettings>, field: keyof LessonSettings) => void;
};

/** Reads the spacing typed in seconds; null with a reason when it is not usable. */
export function parseSpacingSeconds(text: string): { ms: number } | { message: string } {
  const value = Number(text.trim().replace(',', '.'));
  if (text.trim() === '' || !Number.isFinite(value)) return { message: 'Enter the spacing in seconds, for example 0.5.' };
  const ms = Math.round(value * 1000);
  if (ms < 1) return { message: 'Checkpoints need at least 0.001 s between them.' };
  if (ms > LIMITS.minSpacingMsMax) return { message: `The spacing is at most ${LIMITS.minSpacingMsMax / 1000} s.` };
  return { ms };
}

/** The lesson's own settings, shown in the side panel when no checkpoint or chapter is selected. */
export function SettingsEditor({ settings, problems, lessonId, onChange }: SettingsEditorProps) {
  const [spacingText, setSpacingText] = useState<string | null>(null);
  const spacing = spacingText === null ? null : parseSpacingSeconds(spacingText);
  const spacingError = spacing && 'message' in spacing ? spacing.message : messageAt(problems, 'minSpacingMs');
  return (
    <section aria-labelledby="settings-title" className="flex flex-col gap-4">
      <h2 id="settings-title" className="text-xl">
        Lesson settings
      </h2>
      <Field label="Title" error={messageAt(problems, 'title')}>
        {(control) => (
          <Input
            {...control}
            value={settings.title}
            maxLength={LIMITS.lessonTitleMax}
            onChange={(event) => onChange({ title: event.target.value }, 'title')}
          />
        )}
      </Field>
      <Field label="Topic tags" hint="Type a tag and press Enter or a comma." error={messageAt(problems, 'tags')}>
        {(control) => <TagInput {...control} value={settings.tags} onChange={(tags) => onChange({ tags }, 'tags')} />}
      </Field>
      <Field label="Level" hint="For example “Year 10” or “Introductory college”." error={messageAt(problems, 'level')}>
        {(control) => (
          <Input
            {...control}
            value={settings.level}
            maxLength={LIMITS.lessonLevelMax}
            onChange={(event) => onChange({ level: event.target.value }, 'level')}
          />
        )}
      </Field>
      <MarkdownField
        label="Description"
        value={settings.description}
        onChange={(description) => onChange({ description }, 'description')}
        error={messageAt(problems, 'description')}
        lessonId={lessonId}
        maxLength={LIMITS.lessonDescriptionMax}
        small
      />
      <MarkdownField
        label="Safety notes"
        hint="Shown to students before the video starts."
        value={settings.safetyNotes}
        onChange={(safetyNotes) => onChange({ safetyNotes }, 'safetyNotes')}
        error={messageAt(problems, 'safetyNotes')}
        lessonId={lessonId}
        maxLength={LIMITS.safetyNotesMax}
        small
      />
      <SafetySuggestions
        title={settings.title}
        tags={settings.tags}
        description={settings.description}
        safetyNotes={settings.safetyNotes}
        onAdd={(text) => onChange({ safetyNotes: appendCaution(settings.safetyNotes, text) }, 'safetyNotes')}
      />
      <Field label="Minimum spacing between checkpoints (seconds)" hint="Pins closer than this are refused." error={spacingError}>
        {(control) => (
          <Input
            {...control}
            inputMode="decimal"
            className="w-32"
            value={spacingText ?? String(settings.minSpacingMs / 1000)}
            onChange={(event) => {
              setSpacingText(event.target.value);
              const parsed = parseSpacingSeconds(event.target.value);
              if ('ms' in parsed) onChange({ minSpacingMs: parsed.ms }, 'minSpacingMs');
            }}
            onBlur={() => {
              if (spacing && 'ms' in spacing) setSpacingText(null);
            }}
          />
        )}
      </Field>
    </section>
  );
}
