import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { DIAGRAM_PAGE_MODULE, matchRoute, paths } from "@shared/routes";
import { isUuid } from "@server/http/ids";

/** One chunk of the client build, as Vite's manifest lists it. */
interface ManifestChunk {
  file: string;
  isEntry?: boolean;
  imports?: string[];
  css?: string[];
}
type Manifest = Record<string, ManifestChunk>;

/**
 * Pages opened by link whose code, and data, are announced in the HTML: the path pattern (the client's route
 * table), the page's source module (the key of its chunk in the manifest), and the requests the page waits for:
 * the session check and the diagram (only for a well-formed id, which is then safe to write into the HTML).
 */
const PAGES = [
  {
    match: (path: string) => matchRoute(paths.diagram, path)?.id,
    source: DIAGRAM_PAGE_MODULE,
    data: (id: string) => (isUuid(id) ? ["/api/auth/me", `/api/diagrams/${id}`] : []),
  },
];

/** A chunk's key and every chunk it imports, recursively. */
function withImports(manifest: Manifest, key: string, into = new Set<string>()): Set<string> {
  if (!manifest[key] || into.has(key)) return into;
  into.add(key);
  for (const dep of manifest[key].imports ?? []) withImports(manifest, dep, into);
  return into;
}

/** Preload tags for a page chunk and the chunks it imports, less those the entry script already brings. */
function preloadTags(manifest: Manifest, source: string): string[] {
  const inPage = new Set<string>();
  for (const [key, chunk] of Object.entries(manifest)) if (chunk.isEntry) withImports(manifest, key, inPage);
  return [...withImports(manifest, source)]
    .filter((key) => !inPage.has(key))
    .flatMap((key) => [
      `<link rel="modulepreload" crossorigin href="/${manifest[key].file}">`,
      ...(manifest[key].css ?? []).map((css) => `<link rel="stylesheet" crossorigin href="/${css}">`),
    ]);
}

/**
 * The client's index.html for a path: for a page listed above, with its code chunks (from the build's
 * manifest) and its first data requests announced in the head, so the browser fetches them while the entry
 * script still runs instead of only when the router and the page ask. Other paths get the plain page.
 */
export function clientPages(clientDir: string): (path: string) => string {
  const html = readFileSync(join(clientDir, "index.html"), "utf8");
  const manifestFile = join(clientDir, ".vite", "manifest.json");
  const manifest: Manifest = existsSync(manifestFile) ? JSON.parse(readFileSync(manifestFile, "utf8")) : {};
  const pages = PAGES.map((page) => ({ ...page, code: preloadTags(manifest, page.source).join("") }));
  return (path) => {
    for (const page of pages) {
      const param = page.match(path);
      if (param === undefined) continue;
      // Same mode and credentials as the page's own fetches (cors, same-origin), so the browser reuses the answers.
      const dataTags = page.data(param).map((url) => `<link rel="preload" as="fetch" crossorigin="anonymous" href="${url}">`);
      return html.replace("</head>", `${page.code}${dataTags.join("")}</head>`);
    }
    return html;
  };
}
