import { cva, type VariantProps } from 'class-variance-authority';
import type { ButtonHTMLAttributes } from 'react';
import { cn } from '@/lib/cn';
import { SpinnerIcon } from './icons';

export const buttonVariants = cva(
  'inline-flex items-center justify-center gap-2 rounded-md font-bold no-underline transition-colors disabled:cursor-not-allowed disabled:opacity-60 cursor-pointer',
  {
    variants: {
      variant: {
        primary: 'bg-copper text-surface hover:bg-copper-strong',
        secondary: 'border border-line-strong bg-surface text-ink hover:bg-sunken',
        ghost: 'bg-transparent text-ink hover:bg-sunken',
        danger: 'border border-danger bg-surface text-danger hover:bg-danger-soft',
        field: 'bg-teal text-surface hover:bg-teal-strong',
      },
      size: {
        sm: 'min-h-9 px-3 text-sm',
        md: 'min-h-11 px-4 text-base',
        lg: 'min-h-12 px-5 text-lg',
      },
    },
    defaultVariants: { variant: 'primary', size: 'md' },
  },
);

export type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & VariantProps<typeof buttonVariants> & { busy?: boolean };

/** A button; `busy` disables it and shows a spinner while its request is on the way. */
export function Button({ className, variant, size, busy = false, disabled, children, type = 'button', ...props }: ButtonProps) {
  return (
    <button
      type={type}
      className={cn(buttonVariants({ variant, size }), className)}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      {...props}
    >
      {busy ? <SpinnerIcon className="size-4 animate-spin" /> : null}
      {children}
    </button>
  );
}
