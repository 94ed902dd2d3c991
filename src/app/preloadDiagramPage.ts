import type { QueryClient } from "@tanstack/react-query";
import { matchPath } from "react-router-dom";
import { loadDiagramRoute } from "@/app/routes/loadDiagramRoute";
import { meQuery } from "@/features/auth/api/getMe";
import { editorDiagramQuery } from "@/features/editor/api/getEditorDiagram";
import { paths } from "@shared/routes";

/**
 * Opening a diagram by its link: the session check, the diagram and the editor's code are requested side by
 * side as the app starts (the server's page already announced them), not one after another as the page
 * renders. Settles when all three have (a failure included: the page then reports it as usual); null for
 * any other page. Signed out, the diagram's 401 only confirms what the session check says.
 */
export function preloadDiagramPage(client: QueryClient, pathname: string): Promise<unknown> | null {
  const id = matchPath(paths.diagram, pathname)?.params.id;
  if (!id) return null;
  return Promise.allSettled([client.prefetchQuery(meQuery()), client.prefetchQuery(editorDiagramQuery(id)), loadDiagramRoute()]);
}
