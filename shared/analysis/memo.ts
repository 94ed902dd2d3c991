import type { UPoly } from "@shared/analysis/upoly";

/**
 * A small bounded cache for pure functions of one exact polynomial: within one analysis the same
 * polynomial comes back several times (T's denominator is also 1 + L's numerator, often also χ(s)).
 * Example: const fastCounts = memoByPoly(rootCounts); fastCounts(p) === fastCounts(p).
 */
export function memoByPoly<T>(f: (u: UPoly) => T, limit = 64): (u: UPoly) => T {
  const cache = new Map<string, T>();
  return (u) => {
    const key = u.map((c) => `${c.n}/${c.d}`).join(",");
    const hit = cache.get(key);
    if (hit !== undefined) return hit;
    const value = f(u);
    if (cache.size >= limit) cache.delete(cache.keys().next().value as string);
    cache.set(key, value);
    return value;
  };
}
