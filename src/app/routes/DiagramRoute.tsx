import { useParams } from "react-router-dom";
import { EditorPage } from "@/features/editor/components/EditorPage";
import type { ShareSlot } from "@/features/editor/components/EditorSession";
import { SharePanel } from "@/features/shareLinks/components/SharePanel";

const share: ShareSlot = (target) => <SharePanel {...target} />;

export function DiagramRoute() {
  const id = useParams().id!;
  // Keyed by id: moving to another diagram (e.g. after "save as new") starts a fresh session.
  return <EditorPage key={id} id={id} share={share} />;
}
