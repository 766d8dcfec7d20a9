/**
 * mapLimited: bounded asynchronous work. What it must do is common practice for a work queue: results in the
 * items' order, never more than the limit in flight, items started in order.
 */
import { describe, expect, it } from 'vitest';
import { mapLimited } from '../../src/load/mapLimited.ts';

describe('mapLimited()', () => {
  it('keeps at most `limit` items in flight, starts them in order and gives the results in order', async () => {
    let inFlight = 0;
    let most = 0;
    const started: number[] = [];
    // Later items end sooner, so results that came back in the order of ending would be reversed.
    const results = await mapLimited([5, 4, 3, 2, 1, 0, 5, 4, 3, 2], 3, async (delay, index) => {
      started.push(index);
      most = Math.max(most, ++inFlight);
      await new Promise((resolve) => setTimeout(resolve, delay * 3));
      inFlight--;
      return delay * 10;
    });
    expect(results).toEqual([50, 40, 30, 20, 10, 0, 50, 40, 30, 20]);
    expect(most).toBe(3);
    expect(started).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9]);
  });

  it('handles no items, and passes on a failure', async () => {
    expect(await mapLimited([], 4, async () => 1)).toEqual([]);
    await expect(mapLimited([1, 2, 3], 2, async (item) => (item === 2 ? Promise.reject(new Error('item 2 failed')) : item))).rejects.toThrow('item 2 failed');
  });
});
