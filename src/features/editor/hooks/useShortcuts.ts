import { useEffect, useRef } from "react";
import { matchShortcut, type ShortcutAction } from "@/features/editor/lib/shortcuts";

const isField = (t: EventTarget | null) =>
  t instanceof HTMLElement && (t.isContentEditable || ["INPUT", "TEXTAREA", "SELECT"].includes(t.tagName));

/**
 * Runs the editor's shortcuts from anywhere on the page except text fields and open dialogs. Arrow keys
 * on a focused canvas node are left to the canvas, which moves the node itself.
 */
export function useShortcuts(handlers: Partial<Record<ShortcutAction, (shift: boolean) => void>>, readOnly: boolean) {
  const latest = useRef(handlers);
  latest.current = handlers;
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.defaultPrevented || e.isComposing) return;
      const target = e.target instanceof HTMLElement ? e.target : null;
      if (target?.closest("dialog")) return;
      const shortcut = matchShortcut(e, { readOnly, inField: isField(e.target) });
      if (!shortcut) return;
      if (shortcut.action.startsWith("nudge") && target?.closest(".react-flow__node")) return;
      // Enter and Delete on a focused button or link keep their own meaning.
      if ((shortcut.action === "editProperties" || shortcut.action === "clearSelection") && target?.closest("button, a")) return;
      const handler = latest.current[shortcut.action];
      if (!handler) return;
      e.preventDefault();
      handler(e.shiftKey);
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [readOnly]);
}
