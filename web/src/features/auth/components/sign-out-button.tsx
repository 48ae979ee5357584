import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { SignOutIcon } from '@/components/ui/icons';
import { paths } from '@/config/paths';
import { closeOutboxes } from '@/features/watch/outbox/outbox-registry';
import { useAnswerOutbox } from '@/features/watch/outbox/use-answer-outbox';
import { plural } from '@/lib/format';
import { useSignOut } from '../api/sign-out';
import { useSignedInMe } from './me-context';

/**
 * Signs out and opens the sign-in page (the same place the signed-in shell sends anyone it no longer
 * knows). A student with answers still kept on this device is asked first. The header is on every
 * signed-in page, so its use of the answer queue also keeps sending what an earlier page left.
 */
export function SignOutButton() {
  const navigate = useNavigate();
  const mutation = useSignOut();
  const me = useSignedInMe();
  const { status } = useAnswerOutbox({ userId: me.user.id, role: me.active.role, csrfToken: me.csrfToken });
  const [asking, setAsking] = useState(false);
  const signOut = () =>
    mutation.mutate(undefined, {
      onSuccess: () => {
        // What is kept stays on this device, tagged with this student, for their next sign-in here.
        closeOutboxes();
        void navigate(paths.signIn, { replace: true });
      },
    });
  const unsent = status.unsent;
  return (
    <span className="inline-flex flex-col items-end">
      <Button variant="ghost" size="sm" busy={mutation.isPending && !asking} onClick={() => (unsent > 0 ? setAsking(true) : signOut())}>
        <SignOutIcon className="size-4" />
        Sign out
      </Button>
      {mutation.isError && !asking ? (
        <span role="alert" className="text-sm font-bold text-danger">
          Sign-out failed: {mutation.error.message}
        </span>
      ) : null}
      <ConfirmDialog
        open={asking}
        title={`Sign out with ${plural(unsent, 'answer')} not sent?`}
        confirmLabel="Sign out anyway"
        cancelLabel="Stay signed in"
        busy={mutation.isPending}
        error={mutation.isError ? `Sign-out failed: ${mutation.error.message}` : undefined}
        onConfirm={signOut}
        onCancel={() => setAsking(false)}
      >
        <p>
          {unsent === 1 ? 'One answer you gave is' : `${unsent} answers you gave are`} saved on this device but not recorded by Pinfield
          yet. If you sign out now, {unsent === 1 ? 'it stays' : 'they stay'} on this device and {unsent === 1 ? 'is' : 'are'} sent the next
          time you sign in here.
        </p>
        <p className="mt-2">To send {unsent === 1 ? 'it' : 'them'} now, stay signed in until the lesson page says “Saved”.</p>
      </ConfirmDialog>
    </span>
  );
}
