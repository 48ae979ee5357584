import type { HTMLAttributes } from 'react';
import { cn } from '@/lib/cn';

export function Card({ className, ...props }: HTMLAttributes<HTMLElement>) {
  return (
    <section className={cn('rounded-lg border border-line bg-surface p-5 shadow-[0_1px_2px_rgb(27_36_48/0.06)]', className)} {...props} />
  );
}
