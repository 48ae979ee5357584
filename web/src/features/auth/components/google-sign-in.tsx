import { buttonVariants } from '@/components/ui/button';
import { KeyIcon } from '@/components/ui/icons';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';

/** A plain link: the browser navigates to the API, which redirects to the provider (fetch cannot follow that). */
export function GoogleSignIn({ className }: { className?: string }) {
  return (
    <a href={paths.api.google} className={cn(buttonVariants({ variant: 'primary', size: 'lg' }), 'w-full', className)}>
      <KeyIcon className="size-5" />
      Continue with Google
    </a>
  );
}
