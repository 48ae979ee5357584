import { Link } from 'react-router-dom';
import type { RecordingDto } from '@core/contracts';
import { buttonVariants } from '@/components/ui/button';
import { PlusIcon } from '@/components/ui/icons';
import { paths } from '@/config/paths';

type MakeLessonLinkProps = { recording: Pick<RecordingDto, 'id' | 'title' | 'state'>; size?: 'sm' | 'md' };

/** Opens the new-lesson form with this recording chosen; only a ready recording can carry a lesson. */
export function MakeLessonLink({ recording, size = 'md' }: MakeLessonLinkProps) {
  if (recording.state !== 'ready') return null;
  return (
    <Link to={paths.lessons.create(recording.id)} className={buttonVariants({ size })} aria-label={`Make a lesson from ${recording.title}`}>
      <PlusIcon className="size-5" />
      Make a lesson
    </Link>
  );
}
