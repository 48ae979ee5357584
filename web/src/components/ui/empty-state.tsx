import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

/** What is missing, what will appear here, and how it gets here. */
export function EmptyState({
  icon,
  title,
  children,
  className,
}: {
  icon?: ReactNode;
  title: ReactNode;
  children?: ReactNode;
  className?: string;
}) {
  return (
    <div className={cn('flex gap-4 rounded-lg border border-dashed border-line-strong bg-surface p-5', className)}>
      {icon ? <div className="shrink-0 text-teal">{icon}</div> : null}
      <div className="min-w-0">
        <h3 className="text-lg">{title}</h3>
        {children ? <div className="mt-1 text-ink-muted">{children}</div> : null}
      </div>
    </div>
  );
}
