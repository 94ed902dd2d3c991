import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { freshId, idSource } from "@/features/editor/commands/ids";
import { withWireIds } from "@/features/editor/commands/document";

/** The definition, written the slow obvious way (common practice: smallest unused positive suffix). */
function smallestFree(prefix: string, taken: Set<string>): string {
  for (let n = 1; ; n += 1) if (!taken.has(`${prefix}${n}`)) return `${prefix}${n}`;
}

describe("fresh ids", () => {
  it("idSource hands out, one after another, exactly the ids the definition gives (property, common practice)", () => {
    const prefixes = fc.constantFrom("w", "G", "e", "int");
    fc.assert(
      fc.property(fc.array(fc.tuple(prefixes, fc.integer({ min: 1, max: 30 })), { maxLength: 40 }), fc.array(prefixes, { maxLength: 40 }), (used, asks) => {
        const taken = new Set(used.map(([p, n]) => `${p}${n}`));
        const reference = new Set(taken);
        const fresh = idSource(taken);
        for (const prefix of asks) {
          const want = smallestFree(prefix, reference);
          reference.add(want);
          expect(fresh(prefix)).toBe(want);
        }
        expect(taken).toEqual(reference);
      }),
    );
  });

  it("freshId fills the first gap (common practice)", () => {
    const taken = new Set(["w1", "w2", "w4"]);
    expect(freshId("w", taken)).toBe("w3");
    expect(freshId("w", taken)).toBe("w5");
    expect(taken.has("w3") && taken.has("w5")).toBe(true);
  });

  it("withWireIds numbers 2000 id-less wires w1…w2000 around the ids already there, in wire order (common practice)", () => {
    const kept = new Set([3, 10, 1500]);
    const wires = Array.from({ length: 2000 }, (_, i) => (kept.has(i + 1) ? { id: `w${i + 1}`, from: "a", to: "b" } : { from: "a", to: "b" }));
    const doc = withWireIds({ format: "loopwright-diagram", version: 1, parameters: {}, blocks: [], wires, layout: {} } as never);
    const ids = doc.wires.map((w) => w.id);
    expect(new Set(ids).size).toBe(2000);
    expect(ids.filter((_, i) => kept.has(i + 1))).toEqual(["w3", "w10", "w1500"]);
    const reference = new Set(["w3", "w10", "w1500"]);
    const expected: string[] = [];
    for (const w of wires) {
      const id = w.id ?? smallestFree("w", reference);
      reference.add(id);
      expected.push(id);
    }
    expect(ids).toEqual(expected);
  });
});
