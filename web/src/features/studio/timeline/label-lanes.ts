/**
 * Markers close together must stay readable: each label takes the lowest lane where it does not
 * overlap the label before it; when every lane is taken, the marker shows its icon only (its name is
 * still in its accessible label and tooltip) and counts towards its neighbour's "+N".
 */
export type LaneInput = { key: string; x: number; width: number };
export type LaneResult = { lane: number | null; hiddenAfter: number };

export function assignLanes(items: readonly LaneInput[], lanes: number, gapPx = 6): Map<string, LaneResult> {
  const ends: number[] = Array.from({ length: lanes }, () => Number.NEGATIVE_INFINITY);
  const owner: (string | null)[] = Array.from({ length: lanes }, () => null);
  const result = new Map<string, LaneResult>();
  const sorted = [...items].sort((a, b) => a.x - b.x);
  for (const item of sorted) {
    const lane = ends.findIndex((end) => item.x >= end + gapPx);
    if (lane === -1) {
      result.set(item.key, { lane: null, hiddenAfter: 0 });
      // Credit the label that ends furthest right (nearest to this marker) with one more hidden neighbour.
      const nearest = owner[ends.indexOf(Math.max(...ends))];
      const entry = nearest ? result.get(nearest) : undefined;
      if (entry) entry.hiddenAfter += 1;
      continue;
    }
    ends[lane] = item.x + item.width;
    owner[lane] = item.key;
    result.set(item.key, { lane, hiddenAfter: 0 });
  }
  return result;
}
