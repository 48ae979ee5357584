import { suggestCautions, type CautionTopic } from '@core/lessons/safety-suggestions';
import { Button } from '@/components/ui/button';
import { CheckIcon, InfoIcon, PlusIcon } from '@/components/ui/icons';

const TOPIC_LABELS: Record<CautionTopic, string> = {
  cells: 'Cells, batteries and coils',
  magnets: 'Magnets',
  mains: 'Mains electricity',
};

type SafetySuggestionsProps = {
  title: string;
  tags: string[];
  description: string;
  /** The safety notes as they are now: a caution already in them shows as added. */
  safetyNotes: string;
  onAdd: (text: string) => void;
};

/** Adds a caution to the end of the notes, on a paragraph of its own. */
export function appendCaution(notes: string, caution: string): string {
  const trimmed = notes.trimEnd();
  return trimmed ? `${trimmed}\n\n${caution}` : caution;
}

/**
 * The usual cautions for the apparatus the lesson mentions (cells, coils, batteries, magnets, mains), each with
 * a button that adds it to the safety notes. They are suggestions: the school's rules come first.
 */
export function SafetySuggestions({ title, tags, description, safetyNotes, onAdd }: SafetySuggestionsProps) {
  const cautions = suggestCautions({ title, tags, description });
  if (cautions.length === 0) return null;
  return (
    <section
      aria-labelledby="safety-suggestions-heading"
      className="flex flex-col gap-3 rounded-md border-l-4 border-teal bg-teal-soft p-4"
    >
      <h3 id="safety-suggestions-heading" className="flex items-center gap-2 text-lg">
        <InfoIcon className="size-5 text-teal" />
        Suggested cautions
      </h3>
      <p className="text-sm">
        The lesson mentions apparatus with a known hazard. These are the usual cautions; your school’s safety rules and local regulations
        come first, so keep only what fits them.
      </p>
      <ul className="flex flex-col gap-3">
        {cautions.map((caution) => {
          const added = safetyNotes.includes(caution.text);
          return (
            <li key={caution.topic} className="flex flex-col gap-2 rounded-md bg-surface p-3">
              <p className="font-bold">{TOPIC_LABELS[caution.topic]}</p>
              <p>{caution.text}</p>
              <div>
                {added ? (
                  <span className="inline-flex items-center gap-1 text-sm font-bold text-success">
                    <CheckIcon className="size-4" />
                    In the safety notes
                  </span>
                ) : (
                  <Button
                    size="sm"
                    variant="secondary"
                    onClick={() => onAdd(caution.text)}
                    aria-label={`Add to safety notes: ${TOPIC_LABELS[caution.topic]}`}
                  >
                    <PlusIcon className="size-4" />
                    Add to safety notes
                  </Button>
                )}
              </div>
            </li>
          );
        })}
      </ul>
    </section>
  );
}
