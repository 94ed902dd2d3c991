import { describe, expect, it } from "vitest";
import { pinChoices, pinOfValue, pinValue } from "@/features/comments/lib/pinChoices";
import { selectedPin } from "@/features/editor/hooks/useReviewComments";

// The comment form's pin choices (common practice for review tools: a comment is about the whole item or one part).

describe("pinChoices", () => {
  const doc = {
    blocks: [{ id: "G", label: "Plant" }, { id: "e" }],
    wires: [{ id: "w1", from: "e", to: "G" }, { from: "G", to: "e" }],
  };

  it("offers no pin first, then every block with its label, then every wire with an id and its ends", () => {
    expect(pinChoices(doc)).toEqual([
      { value: "", label: "Nothing: the whole version" },
      { value: "block:G", label: "Block G (Plant)" },
      { value: "block:e", label: "Block e" },
      { value: "wire:w1", label: "Wire w1 (e → G)" },
    ]);
  });

  it.each([
    [null, ""],
    [{ blockId: "G" }, "block:G"],
    [{ wireId: "w:1" }, "wire:w:1"],
  ] as const)("turns the pin %j into the value %j and back", (pin, value) => {
    expect(pinValue(pin)).toBe(value);
    expect(pinOfValue(value)).toEqual(pin);
  });
});

describe("selectedPin", () => {
  it.each([
    [{ blocks: ["G"], wires: [] }, { blockId: "G" }],
    [{ blocks: ["G"], wires: ["w1"] }, { blockId: "G" }],
    [{ blocks: [], wires: ["w1"] }, { wireId: "w1" }],
    [{ blocks: ["G", "e"], wires: [] }, null],
    [{ blocks: [], wires: [] }, null],
  ])("suggests %j as %j", (selection, pin) => {
    expect(selectedPin(selection)).toEqual(pin);
  });
});
