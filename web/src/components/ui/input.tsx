import { cva } from 'class-variance-authority';
import type { InputHTMLAttributes, Ref, SelectHTMLAttributes, TextareaHTMLAttributes } from 'react';
import { cn } from '@/lib/cn';

export const inputVariants = cva(
  'block w-full rounded-md border bg-surface px-3 text-base text-ink placeholder:text-ink-muted disabled:bg-sunken',
  {
    variants: {
      invalid: { true: 'border-danger border-2', false: 'border-line-strong' },
      mono: { true: 'font-mono', false: '' },
    },
    defaultVariants: { invalid: false, mono: false },
  },
);

type Common = { invalid?: boolean; mono?: boolean };

export function Input({
  className,
  invalid = false,
  mono = false,
  ref,
  ...props
}: InputHTMLAttributes<HTMLInputElement> & Common & { ref?: Ref<HTMLInputElement> }) {
  return (
    <input
      ref={ref}
      aria-invalid={invalid || undefined}
      className={cn(inputVariants({ invalid, mono }), 'min-h-11 py-2', className)}
      {...props}
    />
  );
}

export function Textarea({
  className,
  invalid = false,
  mono = false,
  ref,
  ...props
}: TextareaHTMLAttributes<HTMLTextAreaElement> & Common & { ref?: Ref<HTMLTextAreaElement> }) {
  return (
    <textarea
      ref={ref}
      aria-invalid={invalid || undefined}
      className={cn(inputVariants({ invalid, mono }), 'py-2', className)}
      {...props}
    />
  );
}

export function Select({
  className,
  invalid = false,
  ref,
  ...props
}: SelectHTMLAttributes<HTMLSelectElement> & { invalid?: boolean; ref?: Ref<HTMLSelectElement> }) {
  return (
    <select
      ref={ref}
      aria-invalid={invalid || undefined}
      className={cn(inputVariants({ invalid }), 'min-h-11 py-2', className)}
      {...props}
    />
  );
}
