import type { StudentCheckpoint } from '@core/contracts';
import { LatexView, LiveModelCard } from '@/components/physics';
import { RichText } from '@/components/rich-text/rich-text';

/** An equation card: the formula, its caption, and the live model with sliders when the teacher added one. */
export function EquationView({ checkpoint }: { checkpoint: Extract<StudentCheckpoint, { kind: 'equation' }> }) {
  return (
    <div className="flex flex-col gap-3">
      <div className="overflow-x-auto">
        <LatexView latex={checkpoint.latex} display />
      </div>
      {checkpoint.caption.trim() ? <RichText markdown={checkpoint.caption} /> : null}
      {checkpoint.model ? <LiveModelCard model={checkpoint.model} /> : null}
    </div>
  );
}
