import { Navigate } from 'react-router-dom';
import { PublicLayout } from '@/components/layouts/public-layout';
import { FieldLinesIcon } from '@/components/ui/icons';
import { Loading } from '@/components/ui/spinner';
import { roleHome } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { DemoAccounts } from '@/features/auth/components/demo-accounts';
import { SignInOptions } from '@/features/auth/components/sign-in-options';

const JOBS = [
  { who: 'Teachers', what: 'record a demonstration, pin checkpoints on its timeline and assign the lesson to a class.' },
  { who: 'Students', what: 'watch, stop at each checkpoint, answer and get feedback on units, signs and significant figures.' },
  { who: 'Coordinators', what: 'see which checkpoints a department’s classes found hardest and which slips they made.' },
  { who: 'Substitute teachers', what: 'run a colleague’s lesson with the class they cover, without changing the original.' },
];

/** The signed-out front page: what Pinfield is for, and the ways to sign in. Signed-in visitors go to their home. */
export default function LandingRoute() {
  const me = useMe();
  if (me.isPending) return <Loading className="px-6" />;
  if (me.data) return <Navigate to={roleHome(me.data.active.role)} replace />;
  return (
    <PublicLayout>
      {/* Phones read the pitch, then sign in, then the roles; wide screens put sign-in beside both. */}
      <div className="grid gap-8 lg:grid-cols-[1fr_26rem] lg:grid-rows-[auto_1fr] lg:gap-x-10">
        <div className="flex flex-col gap-6 lg:col-start-1 lg:row-start-1">
          <div>
            <p className="flex items-center gap-2 font-bold text-teal">
              <FieldLinesIcon className="size-5" />
              For school physics departments
            </p>
            <h1 className="mt-2 text-4xl sm:text-5xl">Demonstrations that stop and ask at the moment that matters</h1>
          </div>
          <p className="max-w-2xl text-lg">
            Pinfield turns a recorded classroom demonstration into a lesson: checkpoints pinned where students usually slip, answers graded
            with the physics they need, and a clear picture of where each class stopped understanding.
          </p>
          {me.isError ? (
            <p role="alert" className="font-bold text-danger">
              Pinfield could not check whether you are signed in: {me.error.message}
            </p>
          ) : null}
        </div>
        <div className="lg:col-start-2 lg:row-span-2 lg:row-start-1">
          <SignInOptions />
        </div>
        <ul className="flex max-w-2xl flex-col gap-3 lg:col-start-1 lg:row-start-2">
          {JOBS.map((job) => (
            <li key={job.who} className="border-l-4 border-copper pl-4">
              <strong>{job.who}</strong> {job.what}
            </li>
          ))}
        </ul>
      </div>
      <div className="mt-10">
        <DemoAccounts />
      </div>
    </PublicLayout>
  );
}
