import type { LiveModel } from '@core/contracts';
import { LatexView } from '@/components/physics/latex-view';
import { LiveModelCard } from '@/components/physics/live-model-card';
import { RichText } from '@/components/rich-text/rich-text';
import { canonicalJson } from '@core/lessons/canonical-json';
import { useBoundField } from '../common/use-bound-field';

/** The card as a student will see it: the formula, the caption and the live model (parse errors show at the field). */
export function EquationPreview() {
  const latex = useBoundField<string>('latex');
  const caption = useBoundField<string>('caption');
  const model = useBoundField<LiveModel | null>('model');
  return (
    <div className="flex flex-col gap-3 rounded-md border border-line bg-paper p-3" aria-label="Card preview">
      {latex.value?.trim() ? (
        <LatexView latex={latex.value} showProblem={false} />
      ) : (
        <p className="text-sm text-ink-muted">No formula yet.</p>
      )}
      {caption.value?.trim() ? <RichText markdown={caption.value} /> : null}
      {/* A new key per configuration: the student's slider positions start from the card's values again. */}
      {model.value ? <LiveModelCard key={canonicalJson(model.value)} model={model.value} /> : null}
    </div>
  );
}
