import type { LessonState } from '@core/contracts';
import { Badge } from '@/components/ui/badge';
import { PeopleIcon } from '@/components/ui/icons';
import { LESSON_STATE_LABELS } from '../lesson-labels';

const TONES = { draft: 'neutral', published: 'success', archived: 'copper' } as const;

/** The lesson's state in words (the colour only repeats them). */
export function LessonStateBadge({ state }: { state: LessonState }) {
  return <Badge tone={TONES[state]}>{LESSON_STATE_LABELS[state]}</Badge>;
}

/** Marks a lesson colleagues and substitutes can open (read-only). */
export function SharedBadge() {
  return (
    <Badge tone="field">
      <PeopleIcon className="size-4" />
      Shared with the department
    </Badge>
  );
}
