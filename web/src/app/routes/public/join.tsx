import { Link } from 'react-router-dom';
import { PublicLayout } from '@/components/layouts/public-layout';
import { Card } from '@/components/ui/card';
import { paths } from '@/config/paths';
import { JoinForm } from '@/features/auth/components/join-form';

/** Signed-out students ask to join a class with its code and their school e-mail. */
export default function JoinRoute() {
  return (
    <PublicLayout>
      <div className="mx-auto flex max-w-xl flex-col gap-6">
        <Card className="flex flex-col gap-4">
          <h1 className="text-3xl">Join a class</h1>
          <p>
            Enter the code your teacher gave you and your school e-mail address. If your school lets students join this way, Pinfield
            e-mails you a link that signs you in and puts you in the class.
          </p>
          <JoinForm />
        </Card>
        <p>
          Already have an account?{' '}
          <Link to={paths.signIn} className="font-bold text-copper underline">
            Sign in
          </Link>
          , then join from your student home.
        </p>
      </div>
    </PublicLayout>
  );
}
