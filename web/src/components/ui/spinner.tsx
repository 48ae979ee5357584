import { cn } from '@/lib/cn';
import { SpinnerIcon } from './icons';

/** A loading indicator with words, so it is never only a moving shape. */
export function Loading({ label = 'Loading…', className }: { label?: string; className?: string }) {
  return (
    <p role="status" className={cn('flex items-center gap-2 py-6 text-ink-muted', className)}>
      <SpinnerIcon className="size-5 animate-spin text-teal" />
      {label}
    </p>
  );
}
