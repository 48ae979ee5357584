import type { SignChoiceSet, SignGeometry } from '@core/contracts';
import { signChoiceLabel } from '@core/lessons/choice-labels';
import { deriveSignAnswer } from '@core/lessons/sign-derivation';
import { GeometryDiagram } from '@/components/physics/geometry-diagram';
import { AlertIcon } from '@/components/ui/icons';
import { useProblemsAt } from '../common/problem-placement';

const percent = (share: number) => `${Math.round(share * 100)} %`;

/**
 * The set-up drawn, and what the engine derives from it as the teacher edits: the answer with the
 * dominant share, or the refusal message (zero field, no dominant direction, on the conductor…).
 */
export function DerivedAnswer({ geometry, choiceSet }: { geometry: SignGeometry; choiceSet: SignChoiceSet }) {
  const derived = deriveSignAnswer(geometry, choiceSet);
  const saved = useProblemsAt('answer.geometry');
  // The last save may report the same refusal; say it once.
  const extra = saved && (derived.ok || !saved.includes(derived.message)) ? saved : undefined;
  const component = choiceSet === 'sign' ? ` (the ${geometry.component} component)` : '';
  return (
    <div className="flex flex-col gap-3">
      <GeometryDiagram geometry={geometry} />
      <div aria-live="polite">
        {derived.ok ? (
          <p className="rounded-md bg-success-soft px-3 py-2 text-success">
            <span className="font-bold">The engine gives: </span>
            {signChoiceLabel(derived.choice).toLowerCase()}
            {component} (share {percent(derived.share)})
          </p>
        ) : (
          <p role="alert" className="flex items-start gap-1.5 rounded-md bg-danger-soft px-3 py-2 font-bold text-danger">
            <AlertIcon className="mt-1 size-4 shrink-0" />
            <span>{derived.message}</span>
          </p>
        )}
      </div>
      {extra ? <p className="text-sm font-bold text-danger">{extra}</p> : null}
    </div>
  );
}
