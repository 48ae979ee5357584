import { cn } from '@/lib/cn';

/**
 * An e-mail address in the monospace face. It may wrap anywhere on a narrow screen rather than push
 * the page wider than the phone; no hidden break characters, so it copies and reads aloud whole.
 */
export function EmailAddress({ email, className }: { email: string; className?: string }) {
  return <span className={cn('font-mono text-sm wrap-anywhere', className)}>{email}</span>;
}
