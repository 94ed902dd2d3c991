import { useEffect, useMemo, useState } from "react";
import type { CommentPin, PinnedThread } from "@shared/api/comments";
import { LoadError, Loading } from "@/components/QueryState";
import { useThreads } from "@/features/comments/api/getThreads";
import { NewThreadForm } from "@/features/comments/components/NewThreadForm";
import { ThreadCard } from "@/features/comments/components/ThreadCard";
import type { PinnableDoc } from "@/features/comments/lib/pinChoices";

export interface CommentsPanelProps {
  diagramId: string;
  /** The saved version the comments belong to; 0 before the first save. */
  version: number;
  /** That version's document: pin choices and block labels. */
  doc: PinnableDoc;
  selected: CommentPin | null;
  /** A comment to bring into view (a mail's link, a pin clicked on the canvas); `at` repeats a request for the same one. */
  focus: { commentId: string; at: number } | null;
  /** Told the threads the canvas should pin, and how many are open, whenever they change. */
  onThreads: (summary: { pins: PinnedThread[]; open: number }) => void;
  onShowPin: (pin: CommentPin) => void;
}

/** The review comments of one saved version: a form to start a thread, the open threads, the resolved ones on request. */
export function CommentsPanel({ diagramId, version, doc, selected, focus, onThreads, onShowPin }: CommentsPanelProps) {
  const threads = useThreads(diagramId, version);
  const [showResolved, setShowResolved] = useState(false);
  const list = useMemo(() => threads.data ?? [], [threads.data]);
  const focusedThread = focus ? list.find((t) => t.id === focus.commentId || t.replies.some((r) => r.id === focus.commentId)) : undefined;
  const shown = useMemo(() => list.filter((t) => showResolved || t.resolvedAt === null), [list, showResolved]);
  const open = list.filter((t) => t.resolvedAt === null).length;

  useEffect(() => {
    const pins = shown.flatMap((t) => (t.pin ? [{ id: t.id, number: t.number, pin: t.pin, resolved: t.resolvedAt !== null }] : []));
    onThreads({ pins, open });
  }, [shown, open, onThreads]);

  // A link to a resolved thread shows the resolved ones, or it would point at nothing; once per request, so
  // resolving the thread afterwards still tucks it away.
  const [revealedFor, setRevealedFor] = useState<number | null>(null);
  if (focus && focusedThread && revealedFor !== focus.at) {
    setRevealedFor(focus.at);
    if (focusedThread.resolvedAt !== null) setShowResolved(true);
  }
  const focusedId = focusedThread?.id;
  useEffect(() => {
    if (focusedId) window.requestAnimationFrame(() => document.getElementById(`thread-${focusedId}`)?.scrollIntoView({ block: "nearest" }));
  }, [focusedId, focus?.at]);

  if (version === 0) return <p className="text-sm text-ink-soft">Save a version first: comments belong to a saved version.</p>;
  if (threads.isPending) return <Loading label="Loading the comments…" />;
  if (threads.isError) return <LoadError what="the comments" error={threads.error} onRetry={() => threads.refetch()} />;

  return (
    <div className="flex flex-col gap-4">
      <p className="text-xs text-ink-soft">Comments on version {version}. Everyone in the team may comment; the author and the thread are e-mailed.</p>
      <NewThreadForm diagramId={diagramId} version={version} doc={doc} selected={selected} />
      {list.length === 0 ? (
        <p className="text-sm text-ink-soft">No comments on this version yet.</p>
      ) : (
        <div className="flex flex-col gap-3">
          {shown.map((t) => (
            <ThreadCard key={t.id} diagramId={diagramId} thread={t} doc={doc} focus={focus && focusedThread?.id === t.id ? focus.commentId : null} onShowPin={onShowPin} />
          ))}
          {list.length > open && (
            <label className="flex items-center gap-2 text-sm">
              <input type="checkbox" checked={showResolved} onChange={(e) => setShowResolved(e.target.checked)} />
              Show resolved ({list.length - open})
            </label>
          )}
        </div>
      )}
    </div>
  );
}
