/**
 * Classical test theory item statistics for a set of checkpoints (common practice: classical test theory).
 *
 * - difficulty: the mean item score (for 0/1 scoring, the proportion correct; higher = easier).
 * - discrimination: the corrected item-total correlation, i.e. the Pearson (point-biserial when the item is
 *   scored 0/1) correlation between the item score and the student's total score on the OTHER items, so the
 *   item does not correlate with itself. null when it is undefined: fewer than two students answered the item,
 *   or the item scores or the rest scores have no variance.
 * - distractors: how many students chose each option (multiple-choice items; responses without `choice` are not
 *   counted there).
 */

/** One graded response. A student who answered an item several times counts with the LAST response in input order. */
export interface ScoredResponse {
  studentId: string;
  itemId: string;
  /** Credit from 0 to 1 (partial credit allowed). */
  score: number;
  /** The option chosen, for multiple-choice items. */
  choice?: string;
}

export interface ItemStatistics {
  itemId: string;
  /** Number of students who answered the item. */
  responses: number;
  difficulty: number;
  discrimination: number | null;
  distractors: Record<string, number>;
}

/**
 * The analysis in two views of the same numbers: keyed by statistic (`difficulty[itemId]`, …) and as one record
 * per item in `items`, sorted by itemId.
 */
export interface ItemAnalysis {
  difficulty: Record<string, number>;
  discrimination: Record<string, number | null>;
  distractors: Record<string, Record<string, number>>;
  items: ItemStatistics[];
}

/** Pearson correlation of two equally long series; null when either has no variance or there are < 2 pairs. */
export function pearson(xs: readonly number[], ys: readonly number[]): number | null {
  const n = xs.length;
  if (n !== ys.length) throw new RangeError(`pearson: the two series differ in length (${n} and ${ys.length}).`);
  if (n < 2) return null;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += xs[i]!;
    my += ys[i]!;
  }
  mx /= n;
  my /= n;
  // Two passes around the means: stable when scores are large and nearly equal.
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = xs[i]! - mx;
    const dy = ys[i]! - my;
    sxy += dx * dy;
    sxx += dx * dx;
    syy += dy * dy;
  }
  // Relative threshold: rounding noise in a constant series must read as "no variance", not as a correlation.
  const tiny = 1e-12;
  if (sxx <= tiny * Math.max(1, mx * mx) * n || syy <= tiny * Math.max(1, my * my) * n) return null;
  const r = sxy / Math.sqrt(sxx * syy);
  return Math.max(-1, Math.min(1, r));
}

/** Item difficulty, corrected item-total discrimination and choice counts for each item in the responses. */
export function itemAnalysis(scoredResponses: readonly ScoredResponse[]): ItemAnalysis {
  // itemId -> studentId -> last response
  const byItem = new Map<string, Map<string, ScoredResponse>>();
  const totals = new Map<string, number>();
  scoredResponses.forEach((r, index) => {
    if (typeof r.studentId !== 'string' || r.studentId === '') {
      throw new TypeError(`Response ${index + 1} has no student id.`);
    }
    if (typeof r.itemId !== 'string' || r.itemId === '') throw new TypeError(`Response ${index + 1} has no item id.`);
    if (typeof r.score !== 'number' || !Number.isFinite(r.score) || r.score < 0 || r.score > 1) {
      throw new RangeError(`Response ${index + 1} (item ${r.itemId}) has score ${String(r.score)}; a score must be from 0 to 1.`);
    }
    let students = byItem.get(r.itemId);
    if (!students) {
      students = new Map();
      byItem.set(r.itemId, students);
    }
    students.set(r.studentId, r);
  });
  for (const students of byItem.values()) {
    for (const [studentId, r] of students) totals.set(studentId, (totals.get(studentId) ?? 0) + r.score);
  }

  const result: ItemAnalysis = { difficulty: {}, discrimination: {}, distractors: {}, items: [] };
  const itemIds = [...byItem.keys()].sort();
  for (const itemId of itemIds) {
    const students = byItem.get(itemId)!;
    const scores: number[] = [];
    const rest: number[] = [];
    const distractors: Record<string, number> = {};
    let sum = 0;
    for (const [studentId, r] of students) {
      scores.push(r.score);
      // Rest score: the student's total without this item (items they did not answer add nothing).
      rest.push(totals.get(studentId)! - r.score);
      sum += r.score;
      if (r.choice !== undefined) distractors[r.choice] = (distractors[r.choice] ?? 0) + 1;
    }
    const stats: ItemStatistics = {
      itemId,
      responses: students.size,
      difficulty: sum / students.size,
      discrimination: pearson(scores, rest),
      distractors,
    };
    result.difficulty[itemId] = stats.difficulty;
    result.discrimination[itemId] = stats.discrimination;
    result.distractors[itemId] = distractors;
    result.items.push(stats);
  }
  return result;
}
