/**
 * The editor page's code chunk: loaded by the router's lazy route, and early by preloadDiagramPage. The module
 * imported here is the one `DIAGRAM_PAGE_MODULE` (@shared/routes) names for the server's page hints.
 */
export const loadDiagramRoute = () => import("@/app/routes/DiagramRoute");
