import { cva, type VariantProps } from 'class-variance-authority';
import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';
import { AlertIcon, CheckIcon, InfoIcon } from './icons';

const bannerVariants = cva('flex items-start gap-3 rounded-md border-l-4 px-4 py-3', {
  variants: {
    tone: {
      error: 'border-danger bg-danger-soft text-ink',
      info: 'border-teal bg-teal-soft text-ink',
      success: 'border-success bg-success-soft text-ink',
    },
  },
  defaultVariants: { tone: 'info' },
});

const ICONS = { error: AlertIcon, info: InfoIcon, success: CheckIcon } as const;
const ICON_COLOURS = { error: 'text-danger', info: 'text-teal', success: 'text-success' } as const;

type BannerProps = VariantProps<typeof bannerVariants> & { title?: ReactNode; children?: ReactNode; className?: string };

/** A message inside the page. Errors are announced at once (role=alert); wrap other async messages in LiveRegion. */
export function Banner({ tone = 'info', title, children, className }: BannerProps) {
  const key = tone ?? 'info';
  const Icon = ICONS[key];
  return (
    <div role={key === 'error' ? 'alert' : undefined} className={cn(bannerVariants({ tone }), className)}>
      <Icon className={cn('mt-1 size-5 shrink-0', ICON_COLOURS[key])} />
      <div className="min-w-0 flex-1">
        {title ? <p className="font-bold">{title}</p> : null}
        {children ? <div className="break-words">{children}</div> : null}
      </div>
    </div>
  );
}
