import { useNavigate } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { FieldError } from '@/components/ui/field';
import { useDuplicateLesson } from '../api/duplicate-lesson';
import { lessonPaths, useSectionBase } from '../section-base';

type DuplicateLessonButtonProps = { lessonId: string; title: string; size?: 'sm' | 'md' };

/** Copies the lesson into the caller's own library (checkpoints included) and opens the copy. */
export function DuplicateLessonButton({ lessonId, title, size = 'sm' }: DuplicateLessonButtonProps) {
  const base = useSectionBase();
  const navigate = useNavigate();
  const mutation = useDuplicateLesson();
  return (
    <span className="inline-flex flex-col items-start gap-1">
      <Button
        size={size}
        variant="secondary"
        busy={mutation.isPending}
        aria-label={`Duplicate ${title}`}
        onClick={() => mutation.mutate(lessonId, { onSuccess: (copy) => void navigate(lessonPaths(base).overview(copy.id)) })}
      >
        Duplicate
      </Button>
      <FieldError message={mutation.isError ? `Not duplicated: ${mutation.error.message}` : undefined} />
    </span>
  );
}
