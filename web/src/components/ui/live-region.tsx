import type { ReactNode } from 'react';

/** A region that stays in the page so screen readers announce what appears in it later (async results). */
export function LiveRegion({ children, className }: { children?: ReactNode; className?: string }) {
  return (
    <div aria-live="polite" aria-atomic="true" className={className}>
      {children}
    </div>
  );
}
