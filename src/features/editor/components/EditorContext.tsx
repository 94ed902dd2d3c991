import { createContext, useContext } from "react";
import type { EditorDoc, Outcome, Point } from "@/features/editor/commands/types";

/**
 * Applies a named command; a refusal is shown to the user, near `at` (client coordinates) when given.
 * Returns whether the command went through.
 */
export type Act = (label: string, command: (doc: EditorDoc) => Outcome, opts?: { coalesce?: string; at?: Point | null }) => boolean;

export interface EditorActions {
  act: Act;
  readOnly: boolean;
}

/** Lets nodes and panels run commands without callbacks travelling inside node data. */
export const EditorContext = createContext<EditorActions | null>(null);

export function useEditorActions(): EditorActions {
  const actions = useContext(EditorContext);
  if (!actions) throw new Error("useEditorActions is used outside the editor");
  return actions;
}
