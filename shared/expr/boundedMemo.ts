/**
 * `compute` remembered for the last `limit` keys (oldest dropped first): a diagram repeats few expressions, and an
 * edit changes few of them, so each is parsed or typeset once per page. `compute` must give immutable values.
 * Example: boundedMemo(2, f)("a") calls f("a") once however often asked.
 */
export function boundedMemo<V>(limit: number, compute: (key: string) => V): (key: string) => V {
  const kept = new Map<string, V>();
  return (key) => {
    if (kept.has(key)) return kept.get(key) as V;
    const value = compute(key);
    if (kept.size >= limit) kept.delete(kept.keys().next().value as string);
    kept.set(key, value);
    return value;
  };
}
