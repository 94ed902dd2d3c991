/** The editor page's code chunk: loaded by the router's lazy route, and early by preloadDiagramPage. */
export const loadDiagramRoute = () => import("@/app/routes/DiagramRoute");
