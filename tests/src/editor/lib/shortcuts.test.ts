import { describe, expect, it } from "vitest";
import { matchShortcut, SHORTCUTS, type KeyLike } from "@/features/editor/lib/shortcuts";

const key = (k: string, mods: Partial<KeyLike> = {}): KeyLike => ({ key: k, ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...mods });
const action = (e: KeyLike, readOnly = false, inField = false) => matchShortcut(e, { readOnly, inField })?.action;

describe("keyboard shortcuts", () => {
  // common practice: the editing keys desktop applications share.
  it.each([
    [key("z", { ctrlKey: true }), "undo"],
    [key("Z", { ctrlKey: true, shiftKey: true }), "redo"],
    [key("y", { ctrlKey: true }), "redo"],
    [key("z", { metaKey: true }), "undo"],
    [key("Delete"), "delete"],
    [key("Backspace"), "delete"],
    [key("c", { ctrlKey: true }), "copy"],
    [key("v", { ctrlKey: true }), "paste"],
    [key("x", { ctrlKey: true }), "cut"],
    [key("a", { ctrlKey: true }), "selectAll"],
    [key("Escape"), "clearSelection"],
    [key("s", { ctrlKey: true }), "save"],
    [key("?", { shiftKey: true }), "help"],
    [key("4"), "add:transfer"],
  ] as const)("%o → %s", (e, expected) => {
    expect(action(e)).toBe(expected);
  });

  it("each key press means at most one shortcut", () => {
    const samples = [...SHORTCUTS.flatMap((s) => s.keys.split(/ or /)), "ArrowLeft", "l", "f", "[", "]"];
    for (const text of samples) {
      const parts = text.split("+");
      const k = parts[parts.length - 1];
      const e = key(k.length === 1 ? k.toLowerCase() : k, { ctrlKey: parts.includes("Ctrl"), shiftKey: parts.includes("Shift") });
      expect(SHORTCUTS.filter((s) => s.test(e)).length).toBeLessThanOrEqual(1);
    }
  });

  it("viewers get no editing keys; typing in a field only keeps Ctrl+S", () => {
    expect(action(key("Delete"), true)).toBeUndefined();
    expect(action(key("2"), true)).toBeUndefined();
    expect(action(key("z", { ctrlKey: true }), true)).toBeUndefined();
    expect(action(key("c", { ctrlKey: true }), true)).toBe("copy");
    expect(action(key("f"), true)).toBe("fitView");
    expect(action(key("Backspace"), false, true)).toBeUndefined();
    expect(action(key("s", { ctrlKey: true }), false, true)).toBe("save");
  });
});
