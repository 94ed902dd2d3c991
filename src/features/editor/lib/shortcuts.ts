import { BLOCK_KINDS } from "@shared/diagram/blockKinds";
import type { BlockType } from "@shared/diagram/schema";
import { withArticle } from "@shared/text/words";
import { BLOCK_TYPES, BLOCK_VIEWS } from "@/features/editor/blockKinds";

export type ShortcutAction =
  | "undo"
  | "redo"
  | "delete"
  | "copy"
  | "cut"
  | "paste"
  | "duplicate"
  | "selectAll"
  | "clearSelection"
  | "nudgeLeft"
  | "nudgeRight"
  | "nudgeUp"
  | "nudgeDown"
  | "layout"
  | "fitView"
  | "help"
  | "save"
  | "nextStep"
  | "previousStep"
  | "editProperties"
  | `add:${BlockType}`;

export interface KeyLike {
  key: string;
  ctrlKey: boolean;
  metaKey: boolean;
  shiftKey: boolean;
  altKey: boolean;
}

export interface Shortcut {
  action: ShortcutAction;
  /** How the help dialog writes the keys. */
  keys: string;
  description: string;
  /** Changes the document (left out for viewers). */
  edits: boolean;
  /** Also works while typing in a field (Ctrl+S). */
  inFields?: boolean;
  test: (e: KeyLike) => boolean;
}

const mod = (e: KeyLike) => e.ctrlKey || e.metaKey;
const plain = (e: KeyLike) => !mod(e) && !e.altKey;
const key = (e: KeyLike, k: string) => e.key.toLowerCase() === k;

/** Every keyboard shortcut of the editor: the handler and the help dialog both read this one table. */
export const SHORTCUTS: Shortcut[] = [
  { action: "undo", keys: "Ctrl+Z", description: "Undo", edits: true, test: (e) => mod(e) && !e.shiftKey && key(e, "z") },
  { action: "redo", keys: "Ctrl+Shift+Z or Ctrl+Y", description: "Redo", edits: true, test: (e) => mod(e) && ((e.shiftKey && key(e, "z")) || key(e, "y")) },
  { action: "delete", keys: "Delete or Backspace", description: "Delete the selection", edits: true, test: (e) => plain(e) && (e.key === "Delete" || e.key === "Backspace") },
  { action: "copy", keys: "Ctrl+C", description: "Copy the selected blocks", edits: false, test: (e) => mod(e) && key(e, "c") },
  { action: "cut", keys: "Ctrl+X", description: "Cut the selected blocks", edits: true, test: (e) => mod(e) && key(e, "x") },
  { action: "paste", keys: "Ctrl+V", description: "Paste", edits: true, test: (e) => mod(e) && key(e, "v") },
  { action: "duplicate", keys: "Ctrl+D", description: "Duplicate the selected blocks", edits: true, test: (e) => mod(e) && key(e, "d") },
  { action: "selectAll", keys: "Ctrl+A", description: "Select everything", edits: false, test: (e) => mod(e) && key(e, "a") },
  { action: "clearSelection", keys: "Esc", description: "Clear the selection", edits: false, test: (e) => e.key === "Escape" },
  { action: "nudgeLeft", keys: "←", description: "Move the selection left (Shift: further)", edits: true, test: (e) => !mod(e) && e.key === "ArrowLeft" },
  { action: "nudgeRight", keys: "→", description: "Move the selection right (Shift: further)", edits: true, test: (e) => !mod(e) && e.key === "ArrowRight" },
  { action: "nudgeUp", keys: "↑", description: "Move the selection up (Shift: further)", edits: true, test: (e) => !mod(e) && e.key === "ArrowUp" },
  { action: "nudgeDown", keys: "↓", description: "Move the selection down (Shift: further)", edits: true, test: (e) => !mod(e) && e.key === "ArrowDown" },
  ...BLOCK_TYPES.map((type): Shortcut => {
    const k = BLOCK_VIEWS[type].rail.key;
    return { action: `add:${type}`, keys: k, description: `Add ${withArticle(BLOCK_KINDS[type].name)}`, edits: true, test: (e) => plain(e) && e.key === k };
  }),
  { action: "editProperties", keys: "Enter", description: "Edit the selected block's properties", edits: false, test: (e) => plain(e) && e.key === "Enter" },
  { action: "layout", keys: "L", description: "Lay the diagram out automatically", edits: true, test: (e) => plain(e) && key(e, "l") },
  { action: "fitView", keys: "F", description: "Fit the whole diagram in view", edits: false, test: (e) => plain(e) && key(e, "f") },
  { action: "previousStep", keys: "[", description: "Previous reduction step", edits: false, test: (e) => plain(e) && e.key === "[" },
  { action: "nextStep", keys: "]", description: "Next reduction step", edits: false, test: (e) => plain(e) && e.key === "]" },
  { action: "save", keys: "Ctrl+S", description: "Save a version", edits: true, inFields: true, test: (e) => mod(e) && key(e, "s") },
  { action: "help", keys: "?", description: "Show these shortcuts", edits: false, test: (e) => !mod(e) && e.key === "?" },
];

/** The shortcut a key press means, if any; viewers only get the ones that do not edit. */
export function matchShortcut(e: KeyLike, opts: { readOnly: boolean; inField: boolean }): Shortcut | undefined {
  return SHORTCUTS.find((s) => (!opts.readOnly || !s.edits) && (!opts.inField || s.inFields) && s.test(e));
}
