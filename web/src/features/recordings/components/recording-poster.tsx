import { useState } from 'react';
import { cn } from '@/lib/cn';

/**
 * The poster frame, or a neutral panel while there is none (still processing, failed) or the short-lived
 * image URL stopped working before the next refresh brings a new one.
 */
export function RecordingPoster({ url, title, className }: { url: string | null; title: string; className?: string }) {
  const [broken, setBroken] = useState<string | null>(null);
  const frame = cn('aspect-video shrink-0 overflow-hidden rounded-md bg-sunken', className);
  if (!url || broken === url) {
    return (
      <div className={cn(frame, 'flex items-center justify-center')} aria-hidden="true">
        <svg viewBox="0 0 48 27" className="h-1/2 text-line-strong" fill="none" stroke="currentColor" strokeWidth={1.5}>
          <rect x="1" y="1" width="46" height="25" rx="3" />
          <path d="M20 8.5v10l8.5-5z" />
        </svg>
      </div>
    );
  }
  return <img src={url} alt={`A frame from “${title}”`} className={cn(frame, 'object-cover')} onError={() => setBroken(url)} />;
}
