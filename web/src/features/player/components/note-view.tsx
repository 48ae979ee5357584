import type { StudentCheckpoint } from '@core/contracts';
import { RichText } from '@/components/rich-text/rich-text';
import { AlertIcon, InfoIcon } from '@/components/ui/icons';
import { cn } from '@/lib/cn';

/** A remark or a safety caution, told apart by an icon and words as well as a tint. */
export function NoteView({ checkpoint }: { checkpoint: Extract<StudentCheckpoint, { kind: 'note' }> }) {
  const safety = checkpoint.tone === 'safety';
  const Icon = safety ? AlertIcon : InfoIcon;
  return (
    <div
      className={cn(
        'flex items-start gap-3 rounded-md border-l-4 px-4 py-3',
        safety ? 'border-copper bg-copper-soft' : 'border-teal bg-teal-soft',
      )}
    >
      <Icon className={cn('mt-1 size-6 shrink-0', safety ? 'text-copper' : 'text-teal')} />
      <div className="min-w-0 flex-1">
        <p className="font-bold">{safety ? 'Safety caution' : 'Remark'}</p>
        <RichText markdown={checkpoint.body} />
      </div>
    </div>
  );
}
