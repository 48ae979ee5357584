import { useId, useRef, useState, type DragEvent } from 'react';
import type { UploadLimitsDto } from '@core/contracts';
import { formatBytes } from '@core/recordings';
import { Button } from '@/components/ui/button';
import { UploadIcon } from '@/components/ui/icons';
import { LiveRegion } from '@/components/ui/live-region';
import { cn } from '@/lib/cn';

type UploadZoneProps = {
  limits: UploadLimitsDto | undefined;
  /** Queues the files; returns sentences about files it did not take (already in the list). */
  onFiles: (files: File[]) => string[];
};

function hasFiles(event: DragEvent): boolean {
  return Array.from(event.dataTransfer.types).includes('Files');
}

/**
 * Where recordings enter: drop files on it or press its button to pick them (several at once). The button
 * is the keyboard way in; the whole area takes drops.
 */
export function UploadZone({ limits, onFiles }: UploadZoneProps) {
  const inputRef = useRef<HTMLInputElement>(null);
  const hintId = useId();
  const [dragging, setDragging] = useState(false);
  const [notices, setNotices] = useState<string[]>([]);

  function take(list: FileList | null) {
    const files = list ? Array.from(list) : [];
    if (files.length > 0) setNotices(onFiles(files));
  }

  return (
    <div
      className={cn(
        'flex flex-col items-center gap-3 rounded-lg border-2 border-dashed px-6 py-8 text-center transition-colors',
        dragging ? 'border-teal bg-teal-soft' : 'border-line-strong bg-surface',
      )}
      onDragEnter={(event) => {
        if (!hasFiles(event)) return;
        event.preventDefault();
        setDragging(true);
      }}
      onDragOver={(event) => {
        if (!hasFiles(event)) return;
        event.preventDefault();
        event.dataTransfer.dropEffect = 'copy';
      }}
      onDragLeave={(event) => {
        // Leaving for a child element is not leaving the zone.
        if (!event.currentTarget.contains(event.relatedTarget as Node | null)) setDragging(false);
      }}
      onDrop={(event) => {
        event.preventDefault();
        setDragging(false);
        take(event.dataTransfer.files);
      }}
    >
      <UploadIcon className="size-10 text-teal" />
      <p className="text-lg font-bold">{dragging ? 'Drop to upload' : 'Drop video files here'}</p>
      <Button onClick={() => inputRef.current?.click()} aria-describedby={hintId}>
        Choose video files
      </Button>
      <p id={hintId} className="text-sm text-ink-muted">
        {limits
          ? `Up to ${formatBytes(limits.maxBytes)} per file. You use ${formatBytes(limits.usedBytes)} of your ${formatBytes(limits.quotaBytes)}.`
          : 'Several files can go at once.'}
      </p>
      <input
        ref={inputRef}
        type="file"
        multiple
        accept={limits?.accept.join(',')}
        aria-label="Video files to upload"
        tabIndex={-1}
        className="sr-only"
        onChange={(event) => {
          take(event.target.files);
          // The same file can be chosen again later (after cancelling it).
          event.target.value = '';
        }}
      />
      <LiveRegion>
        {notices.length > 0 ? (
          <ul className="text-sm font-bold text-ink">
            {notices.map((notice) => (
              <li key={notice}>{notice}</li>
            ))}
          </ul>
        ) : null}
      </LiveRegion>
    </div>
  );
}
