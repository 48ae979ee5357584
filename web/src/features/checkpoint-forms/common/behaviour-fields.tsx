import { BEHAVIOUR_LABELS, BEHAVIOURS, type Behaviour } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { ChoiceField, TextField } from './fields';

const BEHAVIOUR_HINTS: Record<Behaviour, string> = {
  pause: 'The video stops here; the student may answer or carry on watching.',
  gate: 'The video stops here and goes on only once the student has answered.',
  aside: 'Shown beside the video while it keeps playing.',
};

/** How the checkpoint meets the video, and its name on the timeline. */
export function BehaviourFields() {
  return (
    <div className="flex flex-col gap-4">
      <ChoiceField
        path="behaviour"
        label="When the video reaches it"
        choices={BEHAVIOURS.map((value) => ({ value, label: BEHAVIOUR_LABELS[value], hint: BEHAVIOUR_HINTS[value] }))}
      />
      <TextField
        path="label"
        label="Label"
        hint={`Shown on the timeline and in results (at most ${LIMITS.checkpointLabelMax} characters). Empty: the first words of the text.`}
      />
    </div>
  );
}

/** The paths BehaviourFields renders. */
export const BEHAVIOUR_ANCHORS = ['behaviour', 'label'] as const;
