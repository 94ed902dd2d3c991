import type { CommentPin } from "@shared/api/comments";
import { threadRoots } from "@server/features/comments/threads";

export interface VersionPin {
  id: string;
  target: CommentPin;
  /** The thread's number on its version, as the comments panel shows it: "1", "2", … */
  label: string;
}

/**
 * The pinned threads of a version, for drawing their markers (e.g. in the SVG export); resolved ones only when asked.
 * Example: pinsForVersion(diagramId, 3, { includeResolved: false }) → [{ id, target: { blockId: "G" }, label: "1" }].
 */
export async function pinsForVersion(diagramId: string, versionNumber: number, { includeResolved }: { includeResolved: boolean }): Promise<VersionPin[]> {
  const roots = await threadRoots(diagramId, versionNumber);
  return roots.flatMap((root, i) =>
    root.pin && (includeResolved || !root.resolvedAt) ? [{ id: root.id, target: root.pin, label: String(i + 1) }] : [],
  );
}
