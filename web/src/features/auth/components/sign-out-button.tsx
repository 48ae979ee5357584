import { useNavigate } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { SignOutIcon } from '@/components/ui/icons';
import { paths } from '@/config/paths';
import { useSignOut } from '../api/sign-out';

/** Signs out and opens the sign-in page (the same place the signed-in shell sends anyone it no longer knows). */
export function SignOutButton() {
  const navigate = useNavigate();
  const mutation = useSignOut();
  return (
    <span className="inline-flex flex-col items-end">
      <Button
        variant="ghost"
        size="sm"
        busy={mutation.isPending}
        onClick={() => mutation.mutate(undefined, { onSuccess: () => void navigate(paths.signIn, { replace: true }) })}
      >
        <SignOutIcon className="size-4" />
        Sign out
      </Button>
      {mutation.isError ? (
        <span role="alert" className="text-sm font-bold text-danger">
          Sign-out failed: {mutation.error.message}
        </span>
      ) : null}
    </span>
  );
}
