import { useState } from 'react';
import { cn } from '@/lib/cn';

/** The recording's poster frame, or a neutral panel when there is none or its short-lived URL stopped working. */
export function LessonPoster({ url, title, className }: { url: string | null; title: string; className?: string }) {
  const [broken, setBroken] = useState<string | null>(null);
  const frame = cn('aspect-video shrink-0 overflow-hidden rounded-md bg-sunken', className);
  if (!url || broken === url) {
    return (
      <div className={cn(frame, 'flex items-center justify-center')} aria-hidden="true">
        <svg viewBox="0 0 48 27" className="h-1/2 text-line-strong" fill="none" stroke="currentColor" strokeWidth={1.5}>
          <rect x="1" y="1" width="46" height="25" rx="3" />
          <path d="M14 20c4-6 8-8 10-8s6 2 10 8M24 5v7" />
        </svg>
      </div>
    );
  }
  return (
    <img src={url} alt={`A frame from the recording of “${title}”`} className={cn(frame, 'object-cover')} onError={() => setBroken(url)} />
  );
}
