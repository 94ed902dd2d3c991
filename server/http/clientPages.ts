import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";

/** One chunk of the client build, as Vite's manifest lists it. */
interface ManifestChunk {
  file: string;
  isEntry?: boolean;
  imports?: string[];
  css?: string[];
}
type Manifest = Record<string, ManifestChunk>;

/**
 * Pages opened by link whose code is announced in the HTML. The path mirrors the client's route table
 * (src/lib/paths.ts), which the server cannot import.
 */
const PAGE_CHUNKS = [{ path: /^\/diagrams\/[^/]+\/?$/, source: "src/app/routes/DiagramRoute.tsx" }];

/** Preload tags for a page chunk and the chunks it imports, the entry's own excluded (it is already in the page). */
function preloadTags(manifest: Manifest, source: string): string[] {
  const seen = new Set<string>();
  const tags: string[] = [];
  const visit = (key: string) => {
    const chunk = manifest[key];
    if (!chunk || chunk.isEntry || seen.has(key)) return;
    seen.add(key);
    tags.push(`<link rel="modulepreload" crossorigin href="/${chunk.file}">`);
    for (const css of chunk.css ?? []) tags.push(`<link rel="stylesheet" crossorigin href="/${css}">`);
    for (const dep of chunk.imports ?? []) visit(dep);
  };
  visit(source);
  return tags;
}

/**
 * The client's index.html for a path: for a page listed above, with its code chunks announced in the head
 * (from the build's manifest), so the browser fetches and compiles them while the entry script still runs
 * instead of only when the router asks. Without a manifest every path gets the plain page.
 */
export function clientPages(clientDir: string): (path: string) => string {
  const html = readFileSync(join(clientDir, "index.html"), "utf8");
  const manifestFile = join(clientDir, ".vite", "manifest.json");
  const manifest: Manifest = existsSync(manifestFile) ? JSON.parse(readFileSync(manifestFile, "utf8")) : {};
  const pages = PAGE_CHUNKS.map(({ path, source }) => ({ path, html: html.replace("</head>", `${preloadTags(manifest, source).join("")}</head>`) }));
  return (path) => pages.find((p) => p.path.test(path))?.html ?? html;
}
