import type { StudentAssignmentState } from '@core/contracts';
import { Badge } from '@/components/ui/badge';
import { STATE_LABELS } from '../assignment-words';
import { NewIcon, STATE_ICONS, UpdatedIcon } from './state-icons';

const TONES = {
  upcoming: 'neutral',
  'not-started': 'copper',
  'in-progress': 'field',
  done: 'success',
  late: 'danger',
  closed: 'neutral',
} as const satisfies Record<StudentAssignmentState, 'neutral' | 'copper' | 'field' | 'success' | 'danger'>;

/** The assignment's state for this student in words and an icon; the colour only repeats them. */
export function StateBadge({ state }: { state: StudentAssignmentState }) {
  const Icon = STATE_ICONS[state];
  return (
    <Badge tone={TONES[state]} data-state={state}>
      <Icon className="size-4" />
      {STATE_LABELS[state]}
    </Badge>
  );
}

/** Assigned and not opened yet. */
export function NewBadge() {
  return (
    <Badge tone="copper">
      <NewIcon className="size-4" />
      New
    </Badge>
  );
}

/** A teacher's correction changed a grade since the student last looked at their results. */
export function GradeUpdatedBadge() {
  return (
    <Badge tone="field">
      <UpdatedIcon className="size-4" />
      Grade updated
    </Badge>
  );
}
