import { useState } from "react";
import { pinTarget, replySchema, type CommentPin, type CommentView, type ThreadView } from "@shared/api/comments";
import { Button } from "@/components/Button";
import { FormError, TextAreaField } from "@/components/Field";
import { errorMessage } from "@/lib/apiClient";
import { formatDateTime } from "@/lib/format";
import { useReplyToThread } from "@/features/comments/api/replyToThread";
import { useSetThreadResolved } from "@/features/comments/api/setThreadResolved";
import type { PinnableDoc } from "@/features/comments/lib/pinChoices";

interface Props {
  diagramId: string;
  thread: ThreadView;
  doc: PinnableDoc;
  /** The comment a link pointed at (the thread itself or one of its replies), highlighted; else null. */
  focus: string | null;
  onShowPin: (pin: CommentPin) => void;
}

function Comment({ comment, focused }: { comment: CommentView; focused: boolean }) {
  return (
    <div id={`comment-${comment.id}`} className={focused ? "rounded bg-signal-tint px-1.5 py-1" : undefined}>
      <p className="text-xs text-ink-soft">
        <span className="font-medium text-ink">{comment.author.name}</span> · {formatDateTime(comment.createdAt)}
      </p>
      <p className="whitespace-pre-wrap text-sm">{comment.body}</p>
    </div>
  );
}

/** One thread: its pin, root comment and replies, a reply box, resolve or reopen. */
export function ThreadCard({ diagramId, thread, doc, focus, onShowPin }: Props) {
  const focused = focus !== null && (focus === thread.id || thread.replies.some((r) => r.id === focus));
  const [reply, setReply] = useState("");
  const [error, setError] = useState<string>();
  const replying = useReplyToThread(diagramId, thread.versionNumber);
  const resolving = useSetThreadResolved(diagramId, thread.versionNumber);
  const resolved = thread.resolvedAt !== null;
  const name = `Comment ${thread.number}`;

  const send = () => {
    const parsed = replySchema.safeParse({ body: reply });
    if (!parsed.success) return setError(parsed.error.issues.map((i) => i.message).join("; "));
    setError(undefined);
    replying.mutate({ threadId: thread.id, body: parsed.data.body }, { onSuccess: () => setReply(""), onError: (e) => setError(errorMessage(e)) });
  };
  const toggle = () =>
    resolving.mutate({ threadId: thread.id, resolved: !resolved }, { onSuccess: () => setError(undefined), onError: (e) => setError(errorMessage(e)) });

  return (
    <article
      aria-label={name}
      id={`thread-${thread.id}`}
      className={`flex flex-col gap-2 rounded border p-3 ${focused ? "border-signal ring-2 ring-signal/30" : "border-rule"} ${resolved ? "bg-paper-sunk" : "bg-paper-raised"}`}
    >
      <header className="flex flex-wrap items-baseline justify-between gap-1 text-xs">
        <span className="font-semibold">
          {name}
          {thread.pin ? ` on ${pinTarget(thread.pin, doc)}` : " on the whole version"}
        </span>
        {resolved && <span className="text-ink-soft">Resolved by {thread.resolvedBy?.name ?? "a former member"}</span>}
      </header>
      <Comment comment={thread} focused={false} />
      {thread.replies.length > 0 && (
        <div className="flex flex-col gap-2 border-l-2 border-rule pl-2">
          {thread.replies.map((r) => (
            <Comment key={r.id} comment={r} focused={r.id === focus} />
          ))}
        </div>
      )}
      {!resolved && (
        <form
          className="flex flex-col gap-1.5"
          onSubmit={(e) => {
            e.preventDefault();
            send();
          }}
        >
          <TextAreaField label={`Reply to comment ${thread.number}`} rows={2} value={reply} onChange={(e) => setReply(e.target.value)} />
          <div className="flex justify-end">
            <Button type="submit" size="sm" pending={replying.isPending}>
              Reply
            </Button>
          </div>
        </form>
      )}
      <FormError message={error} />
      <div className="flex flex-wrap justify-end gap-2">
        {thread.pin && (
          <Button size="sm" variant="quiet" onClick={() => onShowPin(thread.pin!)}>
            Show on canvas
          </Button>
        )}
        <Button size="sm" pending={resolving.isPending} onClick={toggle}>
          {resolved ? "Reopen" : "Resolve"}
        </Button>
      </div>
    </article>
  );
}
