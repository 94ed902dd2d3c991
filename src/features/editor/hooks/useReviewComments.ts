import { useCallback, useState } from "react";
import type { CommentPin, PinnedThread } from "@shared/api/comments";
import type { Selection } from "@/features/editor/commands/types";
import type { SideTab } from "@/features/editor/components/SidePanel";

/**
 * The editor's side of the review comments: which side tab shows, which comment is in focus (a mail's link or a
 * pin clicked), and the pins and open count the comments panel reports for the canvas and the tab.
 */
export function useReviewComments(linked: string | null) {
  const [tab, setTab] = useState<SideTab>(linked ? "comments" : "properties");
  const [focus, setFocus] = useState(linked ? { commentId: linked, at: 0 } : null);
  const [threads, setThreads] = useState<{ pins: PinnedThread[]; open: number }>({ pins: [], open: 0 });
  const openThread = useCallback((threadId: string) => {
    setTab("comments");
    setFocus({ commentId: threadId, at: Date.now() });
  }, []);
  return { tab, setTab, focus, threads, onThreads: setThreads, openThread };
}

/** The canvas selection as a pin the new-comment form suggests: its one block, else its one wire. */
export const selectedPin = (s: Selection): CommentPin | null =>
  s.blocks.length === 1 ? { blockId: s.blocks[0] } : s.blocks.length === 0 && s.wires.length === 1 ? { wireId: s.wires[0] } : null;
