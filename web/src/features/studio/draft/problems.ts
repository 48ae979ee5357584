import type { LessonContent, LessonProblem } from '@core/contracts';

/**
 * Problems grouped by what they belong to. Paths from the server (and from the shared schema) index
 * into the content that was checked ('checkpoints.3.prompt'); keys are stable while indexes move as
 * checkpoints are added or reordered, so problems are filed by key at the moment they arrive.
 */
export type GroupedProblems = {
  /** By checkpoint key, paths relative to the checkpoint ('options.1.text', '' for the whole checkpoint). */
  checkpoints: Map<string, LessonProblem[]>;
  /** By chapter key, paths relative to the chapter ('endMs'). */
  chapters: Map<string, LessonProblem[]>;
  /** Paths relative to settings ('title'). */
  settings: LessonProblem[];
  /** Anything else ('checkpoints' itself: too many). */
  other: LessonProblem[];
};

export function emptyProblems(): GroupedProblems {
  return { checkpoints: new Map(), chapters: new Map(), settings: [], other: [] };
}

function push(map: Map<string, LessonProblem[]>, key: string, problem: LessonProblem): void {
  const list = map.get(key);
  if (list) list.push(problem);
  else map.set(key, [problem]);
}

export function groupProblems(content: LessonContent, problems: readonly LessonProblem[]): GroupedProblems {
  const grouped = emptyProblems();
  for (const problem of problems) {
    const [head, index, ...rest] = problem.path.split('.');
    const relative = { path: rest.join('.'), message: problem.message };
    const position = Number(index);
    if (head === 'checkpoints' && Number.isInteger(position) && content.checkpoints[position]) {
      push(grouped.checkpoints, content.checkpoints[position].key, relative);
    } else if (head === 'chapters' && Number.isInteger(position) && content.chapters[position]) {
      push(grouped.chapters, content.chapters[position].key, relative);
    } else if (head === 'settings' && index !== undefined) {
      grouped.settings.push({ path: [index, ...rest].join('.'), message: problem.message });
    } else {
      grouped.other.push(problem);
    }
  }
  return grouped;
}

/** Both sources together: the last save's problems and the hard limits the content breaks right now. */
export function mergeProblems(a: GroupedProblems, b: GroupedProblems): GroupedProblems {
  const merged = emptyProblems();
  for (const source of [a, b]) {
    for (const [key, list] of source.checkpoints) for (const p of list) push(merged.checkpoints, key, p);
    for (const [key, list] of source.chapters) for (const p of list) push(merged.chapters, key, p);
    merged.settings.push(...source.settings);
    merged.other.push(...source.other);
  }
  return merged;
}

export function countProblems(grouped: GroupedProblems): number {
  let count = grouped.settings.length + grouped.other.length;
  for (const list of grouped.checkpoints.values()) count += list.length;
  for (const list of grouped.chapters.values()) count += list.length;
  return count;
}

/** The message for one field ('atMs'), or undefined. */
export function messageAt(problems: readonly LessonProblem[] | undefined, path: string): string | undefined {
  return problems?.find((p) => p.path === path)?.message;
}
