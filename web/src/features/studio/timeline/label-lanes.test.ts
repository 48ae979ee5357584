import { describe, expect, it } from 'vitest';
import { assignLanes } from './label-lanes';

describe('label lanes', () => {
  it('keeps labels on the first lane when they are far apart', () => {
    const lanes = assignLanes(
      [
        { key: 'a', x: 0, width: 50 },
        { key: 'b', x: 100, width: 50 },
      ],
      3,
    );
    expect(lanes.get('a')).toEqual({ lane: 0, hiddenAfter: 0 });
    expect(lanes.get('b')).toEqual({ lane: 0, hiddenAfter: 0 });
  });

  it('stacks close labels and hides the rest, counting them', () => {
    const items = [0, 10, 20, 30, 40].map((x, i) => ({ key: `k${i}`, x, width: 60 }));
    const lanes = assignLanes(items, 3);
    expect([0, 1, 2].map((i) => lanes.get(`k${i}`)?.lane)).toEqual([0, 1, 2]);
    expect(lanes.get('k3')).toEqual({ lane: null, hiddenAfter: 0 });
    expect(lanes.get('k4')).toEqual({ lane: null, hiddenAfter: 0 });
    expect(lanes.get('k2')?.hiddenAfter).toBe(2);
  });

  it('reuses a lane once the label before has ended, whatever the input order', () => {
    const lanes = assignLanes(
      [
        { key: 'late', x: 70, width: 40 },
        { key: 'first', x: 0, width: 60 },
        { key: 'second', x: 20, width: 40 },
      ],
      2,
    );
    expect(lanes.get('first')?.lane).toBe(0);
    expect(lanes.get('second')?.lane).toBe(1);
    expect(lanes.get('late')?.lane).toBe(0);
  });
});
