import type { QueryClient } from "@tanstack/react-query";
import { matchPath } from "react-router-dom";
import { meQuery } from "@/features/auth/api/getMe";
import { editorDiagramQuery } from "@/features/editor/api/getEditorDiagram";
import { paths } from "@/lib/paths";

/**
 * Opening a diagram by its link: the session check and the diagram are fetched side by side as the app
 * starts, not one after the other once the page has rendered. Signed out, the diagram's 401 only confirms it.
 */
export function preloadDiagramPage(client: QueryClient, pathname: string): void {
  const id = matchPath(paths.diagram, pathname)?.params.id;
  if (!id) return;
  void client.prefetchQuery(meQuery());
  void client.prefetchQuery(editorDiagramQuery(id));
}
