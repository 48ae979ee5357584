import { Link } from 'react-router-dom';
import type { LessonContent, LessonProblem } from '@core/contracts';
import { useLessonPaths } from '../section-base';
import { problemPlace } from '../problem-place';

type ProblemListProps = { lessonId: string; problems: LessonProblem[]; content: LessonContent; canEdit: boolean; label: string };

/**
 * What stops a lesson from being published, each with where it is and, for its editors, a link that opens the
 * studio at that place (`?problem=<path>`).
 */
export function ProblemList({ lessonId, problems, content, canEdit, label }: ProblemListProps) {
  const studioPath = useLessonPaths().studio;
  return (
    <ul aria-label={label} className="mt-1 flex list-disc flex-col gap-1 pl-5">
      {problems.map((problem) => {
        const place = problemPlace(problem.path, content);
        return (
          <li key={`${problem.path}:${problem.message}`}>
            {canEdit ? (
              <Link to={`${studioPath(lessonId)}?problem=${encodeURIComponent(problem.path)}`} className="font-bold text-copper underline">
                {place}
              </Link>
            ) : (
              <span className="font-bold">{place}</span>
            )}
            : {problem.message}
          </li>
        );
      })}
    </ul>
  );
}
