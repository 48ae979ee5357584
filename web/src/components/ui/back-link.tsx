import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { ArrowLeftIcon } from './icons';

/** The link above a detail page back to the list it was opened from. */
export function BackLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <Link to={to} className="mb-4 inline-flex items-center gap-1 font-bold text-copper underline">
      <ArrowLeftIcon className="size-4" />
      {children}
    </Link>
  );
}
