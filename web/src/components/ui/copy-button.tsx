import { useEffect, useState } from 'react';
import { Button } from './button';
import { CheckIcon, CopyIcon } from './icons';

type CopyState = 'idle' | 'copied' | 'failed';

/** Copies a value (a join code) and says so in words; if the browser refuses, it says how to copy by hand. */
export function CopyButton({ value, label }: { value: string; label: string }) {
  const [state, setState] = useState<CopyState>('idle');
  useEffect(() => {
    if (state === 'idle') return;
    const timer = setTimeout(() => setState('idle'), 2500);
    return () => clearTimeout(timer);
  }, [state]);

  async function copy() {
    try {
      await navigator.clipboard.writeText(value);
      setState('copied');
    } catch {
      setState('failed');
    }
  }

  return (
    <span className="inline-flex items-center gap-2">
      <Button variant="secondary" size="sm" onClick={() => void copy()} aria-label={label}>
        {state === 'copied' ? <CheckIcon className="size-4 text-success" /> : <CopyIcon className="size-4" />}
        {state === 'copied' ? 'Copied' : 'Copy'}
      </Button>
      <span aria-live="polite" className="text-sm text-ink-muted">
        {state === 'failed' ? 'Copying is blocked here: select the code and copy it yourself.' : ''}
      </span>
    </span>
  );
}
