import { createContext, useContext } from 'react';
import type { LessonProblem } from '@core/contracts';

/** Where each publish problem shows: under the field it names, or in the list at the top of the form. */
export type ProblemPlacement = { at: ReadonlyMap<string, string[]>; unplaced: LessonProblem[] };

/**
 * Places each problem at the longest anchor (a rendered field's path) that is its path or a parent of
 * it: 'options.1.text' goes to that field, 'options.1.id' to option 2's box, 'options' above the list.
 */
export function placeProblems(problems: readonly LessonProblem[], anchors: readonly string[]): ProblemPlacement {
  const at = new Map<string, string[]>();
  const unplaced: LessonProblem[] = [];
  for (const problem of problems) {
    let best: string | null = null;
    for (const anchor of anchors) {
      const fits = problem.path === anchor || problem.path.startsWith(`${anchor}.`);
      if (fits && (best === null || anchor.length > best.length)) best = anchor;
    }
    if (best === null) {
      unplaced.push(problem);
      continue;
    }
    at.set(best, [...(at.get(best) ?? []), problem.message]);
  }
  return { at, unplaced };
}

export const ProblemPlacementContext = createContext<ProblemPlacement>({ at: new Map(), unplaced: [] });

/** The publish problems placed at this path, as one message, or undefined. */
export function useProblemsAt(path: string): string | undefined {
  const messages = useContext(ProblemPlacementContext).at.get(path);
  return messages && messages.length > 0 ? messages.join(' ') : undefined;
}
