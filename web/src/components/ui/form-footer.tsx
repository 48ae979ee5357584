import type { ComponentType, ReactNode } from 'react';
import { Banner } from './banner';
import { Button, type ButtonProps } from './button';
import { LiveRegion } from './live-region';

type FormFooterProps = {
  label: ReactNode;
  icon?: ComponentType<{ className?: string }>;
  variant?: ButtonProps['variant'];
  busy: boolean;
  /** What the last submit achieved, or null; announced politely when it appears. */
  success: { title?: ReactNode; body: ReactNode } | null;
  errorTitle: string;
  /** The failure no field could take (see useContractForm), or null. */
  error: string | null;
};

/** A form's submit button, then its success message and its error banner (role=alert). */
export function FormFooter({ label, icon: Icon, variant, busy, success, errorTitle, error }: FormFooterProps) {
  return (
    <>
      <div>
        <Button type="submit" variant={variant} busy={busy}>
          {Icon ? <Icon className="size-5" /> : null}
          {label}
        </Button>
      </div>
      <LiveRegion>
        {success ? (
          <Banner tone="success" title={success.title}>
            {success.body}
          </Banner>
        ) : null}
      </LiveRegion>
      {error ? (
        <Banner tone="error" title={errorTitle}>
          {error}
        </Banner>
      ) : null}
    </>
  );
}
