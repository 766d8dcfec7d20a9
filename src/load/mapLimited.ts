/**
 * Asynchronous work over many items with a bound on how many are in flight.
 */

/**
 * `work` on every item, at most `limit` at a time, each started as an earlier one ends; the results in the items'
 * order. Items are started in order, so they also end roughly in order: with every item started at once, each
 * step of each item's work (a stat, a read) queues behind the same step of all the others, and the first item
 * ends only when nearly all do.
 * @example await mapLimited(['a', 'b', 'c'], 2, async (name) => name.toUpperCase()) // => ['A', 'B', 'C']
 */
export async function mapLimited<T, R>(items: readonly T[], limit: number, work: (item: T, index: number) => Promise<R>): Promise<R[]> {
  const results = new Array<R>(items.length);
  let next = 0;
  const lane = async () => {
    while (next < items.length) {
      const index = next++;
      results[index] = await work(items[index]!, index);
    }
  };
  await Promise.all(Array.from({ length: Math.max(1, Math.min(limit, items.length)) }, lane));
  return results;
}
