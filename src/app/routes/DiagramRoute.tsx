import { useParams } from "react-router-dom";
import { EditorPage } from "@/features/editor/components/EditorPage";
import type { CommentsSlot, ShareSlot } from "@/features/editor/components/EditorSession";
import { CommentsPanel } from "@/features/comments/components/CommentsPanel";
import { SharePanel } from "@/features/shareLinks/components/SharePanel";

const share: ShareSlot = (target) => <SharePanel {...target} />;
const comments: CommentsSlot = (target) => <CommentsPanel {...target} />;

export function DiagramRoute() {
  const id = useParams().id!;
  // Keyed by id: moving to another diagram (e.g. after "save as new") starts a fresh session.
  return <EditorPage key={id} id={id} share={share} comments={comments} />;
}
