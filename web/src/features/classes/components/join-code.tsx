import { CopyButton } from '@/components/ui/copy-button';

/** A class's join code, big and in the monospace face so 0/O and 1/I are easy to tell apart, with a copy button. */
export function JoinCode({ code, className }: { code: string; className: string }) {
  return (
    <div className="flex flex-wrap items-center gap-3">
      <span className="text-sm text-ink-muted">Join code</span>
      <code className="rounded-md bg-sunken px-2.5 py-1 font-mono text-xl font-bold tracking-widest select-all">{code}</code>
      <CopyButton value={code} label={`Copy the join code of ${className}`} />
    </div>
  );
}
