import type { AssignmentPhase } from '@core/contracts';
import { Badge } from '@/components/ui/badge';
import { PHASE_LABELS } from '../assignment-labels';

const TONES = { upcoming: 'neutral', open: 'field', late: 'copper', closed: 'neutral' } as const;

/** Where an assignment is in its dates, in words (the tone only repeats them). */
export function PhaseBadge({ phase }: { phase: AssignmentPhase }) {
  return <Badge tone={TONES[phase]}>{PHASE_LABELS[phase]}</Badge>;
}
