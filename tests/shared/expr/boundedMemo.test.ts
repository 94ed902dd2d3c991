import { describe, expect, it } from "vitest";
import { boundedMemo } from "@shared/expr/boundedMemo";

describe("bounded memo (common practice: a cache that evicts its oldest entry when full)", () => {
  it("computes each key once while kept, and again after being evicted", () => {
    const calls: string[] = [];
    const upper = boundedMemo(2, (k) => (calls.push(k), k.toUpperCase()));
    expect([upper("a"), upper("a"), upper("b"), upper("a")]).toEqual(["A", "A", "B", "A"]);
    expect(calls).toEqual(["a", "b"]);
    upper("c"); // evicts "a", the oldest
    upper("a");
    expect(calls).toEqual(["a", "b", "c", "a"]);
  });
});
