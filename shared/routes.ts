/**
 * The client's route table, shared with the server: the router and every link use these patterns; the server
 * writes invitation links and announces a page's code and data for the paths they match.
 */
export const paths = {
  home: "/",
  signIn: "/sign-in",
  signUp: "/sign-up",
  invite: "/invite/:token",
  teams: "/teams",
  team: "/teams/:teamId",
  members: "/teams/:teamId/members",
  activity: "/teams/:teamId/activity",
  diagram: "/diagrams/:id",
  versions: "/diagrams/:id/versions",
  compare: "/diagrams/:id/compare",
  sheet: "/diagrams/:id/versions/:n/sheet",
  share: "/s/:token",
} as const;

type Path = (typeof paths)[keyof typeof paths];
/** The `:name` segments of a pattern, e.g. "teamId" for "/teams/:teamId/members". */
type ParamsOf<P extends string> = P extends `${string}:${infer Name}/${infer Rest}`
  ? Name | ParamsOf<`/${Rest}`>
  : P extends `${string}:${infer Name}`
    ? Name
    : never;

/** A pattern with its `:name` segments filled in, encoded: `fillPath("/teams/:teamId", { teamId: "a b" })` → "/teams/a%20b". */
export function fillPath<P extends Path>(pattern: P, params: Record<ParamsOf<P>, string>): string {
  return pattern.replace(/:(\w+)/g, (_, name: string) => encodeURIComponent((params as Record<string, string>)[name]));
}

/**
 * The `:name` segments of `path` when it matches `pattern` (a trailing slash allowed), else null:
 * `matchRoute("/diagrams/:id", "/diagrams/42/")` → `{ id: "42" }`.
 */
export function matchRoute<P extends Path>(pattern: P, path: string): Record<ParamsOf<P>, string> | null {
  const names: string[] = [];
  const source = pattern.replace(/:(\w+)/g, (_, name: string) => (names.push(name), "([^/]+)"));
  const match = new RegExp(`^${source}/?$`).exec(path);
  if (!match) return null;
  try {
    return Object.fromEntries(names.map((name, i) => [name, decodeURIComponent(match[i + 1])])) as Record<ParamsOf<P>, string>;
  } catch {
    return null; // a malformed escape is no page of ours
  }
}

const withNext = (path: string, next?: string) =>
  next && next !== paths.home ? `${path}?next=${encodeURIComponent(next)}` : path;

export const href = {
  signIn: (next?: string) => withNext(paths.signIn, next),
  signUp: (next?: string) => withNext(paths.signUp, next),
  invite: (token: string) => fillPath(paths.invite, { token }),
  teams: () => paths.teams,
  team: (teamId: string) => fillPath(paths.team, { teamId }),
  members: (teamId: string) => fillPath(paths.members, { teamId }),
  activity: (teamId: string) => fillPath(paths.activity, { teamId }),
  diagram: (id: string) => fillPath(paths.diagram, { id }),
  /** One saved version, opened read-only in the diagram page. */
  diagramVersion: (id: string, version: number) => `${fillPath(paths.diagram, { id })}?version=${version}`,
  versions: (id: string) => fillPath(paths.versions, { id }),
  /** Two saved versions side by side: what changed from `from` to `to` and what it did to the response. */
  compare: (id: string, from: number, to: number) => `${fillPath(paths.compare, { id })}?from=${from}&to=${to}`,
  share: (token: string) => fillPath(paths.share, { token }),
  /** One saved version's printable review sheet. */
  sheet: (id: string, version: number) => fillPath(paths.sheet, { id, n: String(version) }),
  /** A review comment: the diagram page opens its version's comments with the comment's thread selected. */
  diagramComment: (id: string, version: number, commentId: string) =>
    `${fillPath(paths.diagram, { id })}?version=${version}&comment=${encodeURIComponent(commentId)}`,
};

/** Only same-site paths are followed after sign-in, so a crafted ?next= cannot send anyone elsewhere. */
export const safeNext = (next: string | null): string =>
  next && next.startsWith("/") && !next.startsWith("//") && !next.startsWith("/\\") ? next : paths.teams;

/**
 * The source module of the diagram page, as the client's lazy route imports it (src/app/routes/loadDiagramRoute.ts)
 * and as Vite's build manifest keys its chunk: the server announces that chunk in the HTML of a diagram's link.
 */
export const DIAGRAM_PAGE_MODULE = "src/app/routes/DiagramRoute.tsx";
